import { describe, expect, it } from 'vitest';
import { buildReportDocument } from '../../src/report/report-document';
import { REPORT_CSP, renderHtml } from '../../src/report/render-html';
import { presetCase } from './fixtures';

// W3C Content Security Policy Level 3: a <meta http-equiv> policy applies to what follows it.
describe('HTML report Content-Security-Policy (issue 14 item 9)', () => {
  it('every HTML report carries a policy that allows only inline CSS and data: images, ahead of any content', () => {
    const c = presetCase('coal-room-shale');
    const html = renderHtml(buildReportDocument({ project: c.project, analysis: c.analysis, curve: c.curve, projectText: c.projectText, units: 'SI', version: '0.1.0', date: '2026-12-01' }));
    const meta = `<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">`;
    expect(html).toContain(meta);
    expect(html.indexOf(meta)).toBeLessThan(html.indexOf('<style>'));
    expect(html.indexOf(meta)).toBeLessThan(html.indexOf('<title>'));
    const policy = new Map(REPORT_CSP.split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...values]) => [name, values]));
    expect(policy.get('default-src')).toEqual(["'none'"]);
    expect(policy.get('style-src')).toEqual(["'unsafe-inline'"]);
    expect(policy.get('img-src')).toEqual(['data:']);
    expect(policy.has('script-src')).toBe(false); // falls back to default-src 'none'
    expect(html).not.toMatch(/<script/i);
  });
});
