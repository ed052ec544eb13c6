/**
 * A tiny well-formedness check for the chart SVG strings (node has no DOMParser): tags balance
 * on a stack, attributes are quoted, text has no raw "<" and every "&" starts an entity.
 * Returns a list of problems (empty = well formed).
 */
export function xmlProblems(markup: string): string[] {
  const problems: string[] = [];
  const stack: string[] = [];
  const tag = /<(\/?)([A-Za-z][\w:.-]*)((?:\s+[\w:.-]+\s*=\s*(?:"[^"]*"|'[^']*'))*)\s*(\/?)>/y;
  const entity = /^&(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/;
  let i = 0;
  let roots = 0;
  while (i < markup.length) {
    const c = markup[i];
    if (c === '<') {
      if (markup.startsWith('<!--', i)) {
        const end = markup.indexOf('-->', i + 4);
        if (end < 0) return [...problems, `unterminated comment at ${i}`];
        i = end + 3;
        continue;
      }
      tag.lastIndex = i;
      const m = tag.exec(markup);
      if (!m) return [...problems, `malformed tag at ${i}: ${markup.slice(i, i + 60)}`];
      const [, close, name, attrs, selfClose] = m;
      if (attrs) {
        const seen = new Set<string>();
        for (const a of attrs.matchAll(/([\w:.-]+)\s*=\s*("[^"]*"|'[^']*')/g)) {
          if (seen.has(a[1])) problems.push(`duplicate attribute ${a[1]} on <${name}> at ${i}`);
          seen.add(a[1]);
          const value = a[2].slice(1, -1);
          if (value.includes('<')) problems.push(`raw < in attribute ${a[1]} at ${i}`);
          for (const amp of value.matchAll(/&/g)) {
            if (!entity.test(value.slice(amp.index))) problems.push(`bare & in attribute ${a[1]} at ${i}`);
          }
        }
      }
      if (close) {
        const open = stack.pop();
        if (open !== name) problems.push(`</${name}> closes <${open ?? 'nothing'}> at ${i}`);
      } else if (!selfClose) {
        if (stack.length === 0) roots++;
        stack.push(name);
      } else if (stack.length === 0) roots++;
      i = tag.lastIndex;
      continue;
    }
    if (c === '&' && !entity.test(markup.slice(i, i + 12))) problems.push(`bare & in text at ${i}`);
    if (c === '>') problems.push(`raw > in text at ${i}`);
    if (stack.length === 0 && !/\s/.test(c)) problems.push(`text outside the root at ${i}`);
    i++;
  }
  if (stack.length) problems.push(`unclosed: ${stack.join(' > ')}`);
  if (roots !== 1) problems.push(`expected one root element, found ${roots}`);
  return problems;
}

/** All text-node contents (between tags), entities decoded, joined by newlines. */
export function textContent(markup: string): string {
  return markup
    .replace(/<[^>]*>/g, '\n')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&amp;/g, '&');
}

/** Normalises a chart for snapshots: one tag per line. */
export function normalise(markup: string): string {
  return markup.replace(/></g, '>\n<');
}
