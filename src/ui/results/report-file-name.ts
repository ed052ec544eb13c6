/** A safe download file name from a project title: `Coal room-report.html`. */
export function reportFileName(title: string): string {
  const base = title
    .replace(/[\\/:*?"<>|\u0000-\u001f]+/g, '-')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^[.-]+|[.-]+$/g, '')
    .slice(0, 100);
  return `${base || 'lamina'}-report.html`;
}
