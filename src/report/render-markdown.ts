/**
 * Renders the report model as GitHub-flavoured Markdown: headings, key–value lists, pipe
 * tables, the trace as lists, the caution as block quotes. Charts are not embedded; each is
 * referenced as "(chart in the HTML report)". User text is escaped so that it shows as text
 * (no raw HTML, no accidental emphasis or table breaks).
 */
import type { Block, Cell, ReportDocument, TableBlock } from './document-types';

/** Escape Markdown-significant characters and HTML tags in plain text. */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/\\/g, '\\\\')
    .replace(/&(?=#?[A-Za-z0-9]+;)/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/([`*[\]#|~])/g, '\\$1')
    // An underscore inside a word never starts emphasis in GFM; escape only the others.
    .replace(/(^|\W)_|_(?=\W|$)/g, (m) => m.replace('_', '\\_'))
    .replace(/\r?\n/g, ' ');
}

/** Inline code span that survives any backticks inside. */
function code(text: string): string {
  const clean = text.replace(/\r?\n/g, ' ');
  const fence = clean.includes('`') ? '``' : '`';
  return `${fence}${fence.length > 1 ? ' ' : ''}${clean}${fence.length > 1 ? ' ' : ''}${fence}`;
}

function table(block: TableBlock): string {
  const head = `| ${block.columns.map((c) => escapeMarkdown(c.title)).join(' | ')} |`;
  const rule = `| ${block.columns.map((c) => (c.numeric ? '---:' : '---')).join(' | ')} |`;
  const rows = block.rows.map((r: Cell[]) => `| ${r.map((c) => escapeMarkdown(c.text)).join(' | ')} |`);
  return [`*${escapeMarkdown(block.caption)}*`, '', head, rule, ...rows].join('\n');
}

function renderBlock(block: Block): string {
  switch (block.kind) {
    case 'heading':
      return `${'#'.repeat(block.level)} ${escapeMarkdown(block.text)}`;
    case 'paragraph':
      return block.strong ? `**${escapeMarkdown(block.text)}**` : escapeMarkdown(block.text);
    case 'keyValue':
      return block.items.map((i) => `- **${escapeMarkdown(i.key)}:** ${escapeMarkdown(i.value)}`).join('\n');
    case 'list':
      return block.items.map((i) => `- ${escapeMarkdown(i)}`).join('\n');
    case 'table':
      return table(block);
    case 'formula': {
      const lines = [
        `**${escapeMarkdown(block.label)}** — ${code(block.path)}`,
        '',
        `- Formula: ${escapeMarkdown(block.formula)}`,
        `- With values: ${escapeMarkdown(block.substituted)}`,
        ...(block.values.length ? [`- Values: ${escapeMarkdown(block.values.join('; '))}`] : []),
        `- Result: **${escapeMarkdown(block.result)}**`,
        `- Source: ${escapeMarkdown(block.source)}`,
        ...(block.note ? [`- Note: ${escapeMarkdown(block.note)}`] : []),
      ];
      return lines.join('\n');
    }
    case 'chart':
      return `*${escapeMarkdown(block.title)}: (chart in the HTML report)*`;
    case 'callout': {
      const title = block.tone === 'caution' ? block.title.toUpperCase() : block.title;
      return `> **${escapeMarkdown(title)}.** ${escapeMarkdown(block.text)}`;
    }
  }
}

export function renderMarkdown(doc: ReportDocument): string {
  const out: string[] = [`# ${escapeMarkdown(doc.title)}`];
  for (const section of doc.sections) {
    out.push(`## ${escapeMarkdown(section.title)}`);
    for (const block of section.blocks) out.push(renderBlock(block));
  }
  return `${out.join('\n\n')}\n`;
}
