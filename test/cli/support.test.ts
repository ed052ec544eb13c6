/**
 * `lamina support` and the support lines of `lamina check` on the bolted coal-room demo
 * (invented data) at 7 m: 1.8 m, 100 kN suspension bolts at 1.2 × 1.2 m carry the 0.5 m shale
 * (25 kN/m³): 12.5 kPa × 1.44 m² = 18.0 kN per bolt, FS 5.56 (statics, METHODS §12).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { run, type Io } from '../../src/cli/main';
import { CAUTION } from '../../src/model/caution';
import { presetFiles } from '../analysis/fixtures';
import { analyse } from '../../src/analysis/analyse';
import { readProjectText } from '../../src/model/project-file';
import { buildReportDocument } from '../../src/report/report-document';

function fakeIo(files: Record<string, string>) {
  const out: string[] = [];
  const err: string[] = [];
  const io: Io = {
    out: (t) => void out.push(t),
    err: (t) => void err.push(t),
    readFile: (p) => (p in files ? files[p] : readFileSync(p, 'utf8')),
    writeFile: () => undefined,
    readStdin: () => files['-'],
    errIsTty: false,
  };
  return { io, out: () => out.join(''), err: () => err.join('') };
}

const coal = JSON.parse(readFileSync(presetFiles().find((f) => f.includes('coal-room'))!, 'utf8'));
const bolted = JSON.stringify({
  ...coal,
  opening: { ...coal.opening, span_m: 7 },
  support: { standing_kPa: 0, bolts: { length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2 } },
});

describe('lamina support', () => {
  it('prints the bolt results and the support needed, with the caution', async () => {
    const f = fakeIo({ 'b.lamina.json': bolted });
    const code = await run(['support', 'b.lamina.json'], f.io);
    expect([0, 1]).toContain(code);
    const text = f.out();
    expect(text).toContain(CAUTION);
    expect(text).toContain('load per bolt 18 kN');
    expect(text).toContain('largest square bolt spacing     2.3');
    expect(text).not.toMatch(/NaN|Infinity/);
  }, 60_000);

  it('--json carries support.needed and the bolts', async () => {
    const f = fakeIo({ 'b.lamina.json': bolted });
    await run(['support', 'b.lamina.json', '--json'], f.io);
    const j = JSON.parse(f.out());
    expect(j.support.bolts.load_kN).toBeCloseTo(18, 9);
    expect(j.support.needed.boltSpacing_m).toBeCloseTo(Math.sqrt(100 / 18.75), 2);
  });

  it('check prints the bolt, skin rows and the support lines; --json includes support and empirical', async () => {
    const f = fakeIo({ 'b.lamina.json': bolted });
    await run(['check', 'b.lamina.json'], f.io);
    expect(f.out()).toContain('bolt load (suspension)');
    expect(f.out()).toContain('skin between bolts');
    expect(f.out()).toContain('suspended: 1 Laminated grey shale');
    const g = fakeIo({ 'b.lamina.json': bolted });
    await run(['check', 'b.lamina.json', '--json'], g.io);
    const j = JSON.parse(g.out());
    expect(j.support.bolts.fsBolt).toBeCloseTo(100 / 18, 9);
    expect('empirical' in j).toBe(true);
  });

  it('bad support input is refused with the field path (exit 2)', async () => {
    const bad = JSON.parse(bolted);
    bad.support.bolts.spacingAcross_m = -1;
    const f = fakeIo({ 'x.lamina.json': JSON.stringify(bad) });
    expect(await run(['support', 'x.lamina.json'], f.io)).toBe(2);
    expect(f.err()).toContain('support.bolts.spacingAcross_m');
  });
});

describe('report support section', () => {
  it('--markdown has a Support section with the bolt rows and the load per bolt; a preset without support has none', async () => {
    const f = fakeIo({ 'b.lamina.json': bolted });
    await run(['check', 'b.lamina.json', '--markdown'], f.io);
    const md = f.out();
    expect(md).toMatch(/Support/);
    expect(md).toContain('bolt load (suspension)');
    expect(md).toContain('Load per bolt');
    expect(md).not.toMatch(/NaN|Infinity/);
    const g = fakeIo({});
    await run(['check', presetFiles().find((x) => x.includes('coal-room'))!, '--markdown'], g.io);
    expect(g.out()).not.toContain('Load per bolt');
  }, 60_000);

  it('the report draws the bolts in the strata (one bolt group per bolt: 7 m at 1.2 m → 6 bolts, hand geometry)', () => {
    const project = readProjectText(bolted).project;
    const doc = buildReportDocument({ project, analysis: analyse(project), curve: null, projectText: bolted, units: 'SI', version: '0.1.0', date: '2026-12-02' });
    const section = doc.sections.find((x) => x.id === 'support');
    const chart = section?.blocks.find((b) => b.kind === 'chart');
    const svg = chart?.kind === 'chart' ? chart.svg : '';
    expect(svg.match(/<g class="bolt">/g)).toHaveLength(6);
    expect(svg).toContain('suspended from the bolts');
  });

  it('--units US shows bolt capacity and load in kips (18 kN / 4.448222 kN per kip = 4.05 kip; METHODS §13 lbf)', async () => {
    const f = fakeIo({ 'b.lamina.json': bolted });
    await run(['support', 'b.lamina.json', '--units', 'US'], f.io);
    expect(f.out()).toContain('load per bolt 4.05 kip');
    expect(f.out()).toContain('22.5 kip each'); // 100 kN / 4.448222
  }, 60_000);
});
