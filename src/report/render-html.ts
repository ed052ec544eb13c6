/**
 * Renders the report model as ONE self-contained HTML file: inline CSS and SVG, no scripts,
 * no external requests (and a Content-Security-Policy that forbids them, `REPORT_CSP`),
 * print CSS (A4 or Letter via `@page`, each main section on a new page,
 * table headers repeated, rows kept whole). Every piece of user text is escaped; chart SVG comes
 * from src/report/charts, whose builders escape their own text.
 *
 *     renderHtml(doc)                       // "<!doctype html>…"
 *     renderHtmlBody(doc)                   // "<article class=\"lamina-report\">…" for the app
 */
import type { Block, Cell, ReportDocument, Section, TableBlock } from './document-types';

export type Paper = 'A4' | 'Letter';

/** Escape text for HTML text nodes and attribute values. */
export function escapeHtml(text: unknown): string {
  return String(text)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** Styles for the report, scoped to `.lamina-report` so the app can embed the body as is. */
export const REPORT_CSS = `
.lamina-report { font: 10.5pt/1.45 system-ui, -apple-system, "Segoe UI", Roboto, Helvetica, Arial, sans-serif; color: #111; max-width: 60rem; margin: 0 auto; padding: 1rem; }
.lamina-report h1 { font-size: 1.6em; margin: 0 0 .4em; }
.lamina-report h2 { font-size: 1.3em; border-bottom: 1.5px solid #111; padding-bottom: .15em; margin: 1.4em 0 .6em; }
.lamina-report h3 { font-size: 1.1em; margin: 1.2em 0 .4em; }
.lamina-report h4 { font-size: 1em; margin: 1em 0 .3em; }
.lamina-report p.lr-strong { font-weight: 600; }
.lamina-report table { border-collapse: collapse; width: 100%; margin: .3em 0 1em; font-size: .92em; }
.lamina-report caption { text-align: left; font-style: italic; padding: .2em 0; }
.lamina-report th, .lamina-report td { border: 1px solid #999; padding: .2em .4em; vertical-align: top; text-align: left; }
.lamina-report th { background: #f0f0f0; font-weight: 600; }
.lamina-report td.lr-num, .lamina-report th.lr-num { text-align: right; font-variant-numeric: tabular-nums; }
.lamina-report dl.lr-kv { display: grid; grid-template-columns: max-content 1fr; gap: .15em 1em; margin: .3em 0 1em; }
.lamina-report dl.lr-kv dt { font-weight: 600; }
.lamina-report dl.lr-kv dd { margin: 0; }
.lamina-report .lr-status-meets { color: #0072B2; }
.lamina-report .lr-status-below { color: #D55E00; font-weight: 700; }
.lamina-report .lr-status-info, .lamina-report .lr-status-na { color: #555; }
.lamina-report .lr-callout { border: 1.5px solid #111; border-left-width: 6px; padding: .5em .8em; margin: .6em 0 1em; background: #fafafa; }
.lamina-report .lr-callout-caution { border-color: #D55E00; background: #fff7f0; }
.lamina-report .lr-callout-error { border-color: #D55E00; }
.lamina-report .lr-callout-warning { border-color: #E69F00; }
.lamina-report .lr-callout-title { font-weight: 700; margin-right: .4em; }
.lamina-report .lr-formula { border-left: 3px solid #999; padding: .2em .7em; margin: .5em 0 .8em; break-inside: avoid; }
.lamina-report .lr-formula-label { font-weight: 600; }
.lamina-report .lr-formula code, .lamina-report code { font: .9em ui-monospace, "DejaVu Sans Mono", Menlo, Consolas, monospace; color: #333; }
.lamina-report .lr-formula dl { display: grid; grid-template-columns: max-content 1fr; gap: .05em .8em; margin: .2em 0; }
.lamina-report .lr-formula dt { color: #555; }
.lamina-report .lr-formula dd { margin: 0; }
.lamina-report .lr-formula .lr-result { font-weight: 700; }
.lamina-report figure.lr-chart { margin: .6em 0 1.2em; break-inside: avoid; }
.lamina-report figure.lr-chart svg { width: 100%; height: auto; max-height: 14cm; }
.lamina-report figcaption { font-style: italic; font-size: .92em; }
@media print {
  .lamina-report { max-width: none; padding: 0; font-size: 9pt; line-height: 1.35; }
  .lamina-report h2 { margin: 1em 0 .4em; }
  .lamina-report h3 { margin: .8em 0 .3em; }
  .lamina-report dl.lr-kv { grid-template-columns: 20% 30% 20% 30%; gap: .1em .6em; }
  .lamina-report table { margin: .2em 0 .6em; font-size: .86em; }
  .lamina-report th, .lamina-report td { padding: .1em .3em; }
  .lamina-report figure.lr-chart { margin: .4em 0 .6em; }
  .lamina-report section:not(.lr-appendix) figure.lr-chart svg { max-height: 6.3cm; }
  .lamina-report section.lr-appendix-first { break-before: page; }
  .lamina-report h2, .lamina-report h3, .lamina-report h4 { break-after: avoid; }
  .lamina-report thead { display: table-header-group; }
  .lamina-report tr, .lamina-report .lr-callout { break-inside: avoid; }
  .lamina-report .lr-callout-caution { background: none; }
}
`;

const pageCss = (paper: Paper): string => `@page { size: ${paper} portrait; margin: 15mm 14mm 16mm; }`;

function cellHtml(cell: Cell, tag: 'td' | 'th'): string {
  const classes = [cell.numeric ? 'lr-num' : '', cell.status ? `lr-status-${cell.status}` : ''].filter((c) => c).join(' ');
  return `<${tag}${classes ? ` class="${classes}"` : ''}>${escapeHtml(cell.text)}</${tag}>`;
}

function tableHtml(block: TableBlock): string {
  const head = block.columns.map((c) => `<th scope="col"${c.numeric ? ' class="lr-num"' : ''}>${escapeHtml(c.title)}</th>`).join('');
  const rows = block.rows.map((r) => `<tr>${r.map((c) => cellHtml(c, 'td')).join('')}</tr>`).join('\n');
  return `<table><caption>${escapeHtml(block.caption)}</caption><thead><tr>${head}</tr></thead><tbody>\n${rows}\n</tbody></table>`;
}

function blockHtml(block: Block): string {
  switch (block.kind) {
    case 'heading':
      return `<h${block.level}>${escapeHtml(block.text)}</h${block.level}>`;
    case 'paragraph':
      return `<p${block.strong ? ' class="lr-strong"' : ''}>${escapeHtml(block.text)}</p>`;
    case 'keyValue':
      return `<dl class="lr-kv">${block.items.map((i) => `<dt>${escapeHtml(i.key)}</dt><dd>${escapeHtml(i.value)}</dd>`).join('')}</dl>`;
    case 'list':
      return `<ul>${block.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`;
    case 'table':
      return tableHtml(block);
    case 'formula': {
      const rows: Array<[string, string, string?]> = [
        ['Formula', block.formula],
        ['With values', block.substituted],
        ...(block.values.length ? [['Values', block.values.join('; ')] as [string, string]] : []),
        ['Result', block.result, 'lr-result'],
        ['Source', block.source],
        ...(block.note ? [['Note', block.note] as [string, string]] : []),
      ];
      const dl = rows.map(([k, v, cls]) => `<dt>${escapeHtml(k)}</dt><dd${cls ? ` class="${cls}"` : ''}>${escapeHtml(v)}</dd>`).join('');
      return `<div class="lr-formula"><div class="lr-formula-label">${escapeHtml(block.label)} <code title="${escapeHtml(block.expression)}">${escapeHtml(block.path)}</code></div><dl>${dl}</dl></div>`;
    }
    case 'chart':
      return `<figure class="lr-chart">${block.svg}<figcaption>${escapeHtml(block.title)}${block.caption ? ` — ${escapeHtml(block.caption)}` : ''}</figcaption></figure>`;
    case 'callout':
      return `<aside class="lr-callout lr-callout-${block.tone}" role="${block.tone === 'note' ? 'note' : 'alert'}"><span class="lr-callout-title">${escapeHtml(block.title)}.</span>${escapeHtml(block.text)}</aside>`;
  }
}

function sectionHtml(section: Section, index: number, sections: readonly Section[]): string {
  const blocks = section.blocks.map(blockHtml).join('\n');
  // The appendix starts on a new page; the summary runs on without page breaks.
  const first = section.appendix && !sections[index - 1]?.appendix ? ' lr-appendix lr-appendix-first' : section.appendix ? ' lr-appendix' : '';
  return `<section class="lr-section lr-section-${section.id}${first}" id="lr-${section.id}" aria-labelledby="lr-${section.id}-title">\n<h2 id="lr-${section.id}-title">${escapeHtml(section.title)}</h2>\n${blocks}\n</section>`;
}

/** The report as an `<article>` (no `<html>`/`<head>`), for embedding next to REPORT_CSS. */
export function renderHtmlBody(doc: ReportDocument): string {
  return `<article class="lamina-report" lang="en">\n<h1>${escapeHtml(doc.title)}</h1>\n${doc.sections.map((s, i, all) => sectionHtml(s, i, all)).join('\n')}\n</article>`;
}

/**
 * Content-Security-Policy of the HTML report: it needs nothing but its own inline CSS (and
 * data: images, should a chart ever embed one), so everything else — scripts, frames, fonts,
 * network requests, forms, plugins — is refused by the browser even if some text slipped past
 * the escaping. W3C Content Security Policy Level 3; a `<meta>` policy must come before any
 * content it governs.
 */
export const REPORT_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'";

export function renderHtml(doc: ReportDocument, options: { paper?: Paper } = {}): string {
  const paper = options.paper ?? 'A4';
  if (paper !== 'A4' && paper !== 'Letter') throw new RangeError(`paper must be "A4" or "Letter", got ${JSON.stringify(paper)}`);
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<meta name="generator" content="Lamina ${escapeHtml(doc.meta.version)}">`,
    `<title>${escapeHtml(doc.title)}</title>`,
    `<style>${pageCss(paper)}${REPORT_CSS}</style>`,
    '</head>',
    '<body>',
    renderHtmlBody(doc),
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
