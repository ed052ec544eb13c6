import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { CAUTION } from '../../src/model/caution';

const html = readFileSync(fileURLToPath(new URL('../../index.html', import.meta.url)), 'utf8');

describe('index.html', () => {
  it('the <noscript> block carries the caution word for word (DESIGN.md "Caution"; HTML cannot import caution.ts)', () => {
    const noscript = /<noscript>([\s\S]*?)<\/noscript>/.exec(html)?.[1] ?? '';
    const text = noscript.replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
    expect(text).toContain(CAUTION);
  });

  it('loads only the module entry from its own origin: no external script, stylesheet or font', () => {
    expect(html).toContain('<script type="module" src="/src/main.ts"></script>');
    expect(html).not.toMatch(/(src|href)=["']https?:/);
    expect(html).not.toMatch(/@import|@font-face/);
  });

  it('carries a Content-Security-Policy before any script: scripts from its own origin only, no eval, no frames or plugins (W3C CSP Level 3)', () => {
    const meta = /<meta\s+http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(html);
    expect(meta).not.toBeNull();
    const policy = new Map(meta![1].split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...values]) => [name, values]));
    expect(policy.get('script-src')).toEqual(["'self'"]);
    expect(policy.get('default-src')).toEqual(["'self'"]);
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('frame-src')).toEqual(["'none'"]);
    expect(meta![1]).not.toMatch(/unsafe-eval|https?:|\*/);
    expect(html.indexOf('Content-Security-Policy')).toBeLessThan(html.indexOf('<script'));
  });
});

