import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { execFileSync, spawnSync } from 'node:child_process';
import { csvParse } from 'd3';
import { run, type Io } from '../../src/cli/main';
import { CAUTION } from '../../src/model/caution';
import { presetFiles } from '../analysis/fixtures';

function fakeIo(files: Record<string, string> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const written: Record<string, string> = {};
  const io: Io = {
    out: (t) => void out.push(t),
    err: (t) => void err.push(t),
    readFile: (p) => {
      if (p in files) return files[p];
      return readFileSync(p, 'utf8');
    },
    writeFile: (p, t) => void (written[p] = t),
    readStdin: () => {
      if ('-' in files) return files['-'];
      throw new Error('no standard input in this test');
    },
    errIsTty: false,
  };
  return { io, out: () => out.join(''), err: () => err.join(''), written };
}

const example = JSON.parse(readFileSync(presetFiles().find((f) => f.includes('coal-room'))!, 'utf8'));

describe('lamina CLI', () => {
  it('--help prints the usage and the caution, exit 0', async () => {
    const f = fakeIo();
    expect(await run(['--help'], f.io)).toBe(0);
    expect(f.out()).toContain(CAUTION);
    expect(f.out()).toContain('check');
  });
  it('--help documents --no-trace next to the report options and still carries the caution', async () => {
    const f = fakeIo();
    expect(await run(['--help'], f.io)).toBe(0);
    expect(f.out()).toMatch(/--no-trace\s+with --markdown or --html: the summary alone, without the appendix/);
    expect(f.out()).toContain(CAUTION);
  });
  it('check --markdown --no-trace prints the summary with both cautions and no appendix; without it the trace appendix is there, each entry once', { timeout: 60_000 }, async () => {
    const file = presetFiles().find((x) => x.includes('coal-room'))!;
    const full = fakeIo();
    await run(['check', file, '--markdown'], full.io);
    const short = fakeIo();
    expect([0, 1]).toContain(await run(['check', file, '--markdown', '--no-trace'], short.io));
    expect(full.out()).toContain('## Appendix B — Calculation trace');
    expect(short.out()).not.toContain('## Appendix');
    expect(short.out()).toContain('## Checks');
    expect(short.out()).toContain('Summary only');
    expect(short.out().split(CAUTION).length - 1).toBe(2); // first and last block
    // every trace entry (its path in code) once in the full report
    const paths = [...full.out().matchAll(/^\*\*.*\*\* — `([^`]+)`$/gm)].map((m) => m[1]);
    expect(paths.length).toBeGreaterThan(40);
    expect(new Set(paths).size).toBe(paths.length);
    expect(short.out().length).toBeLessThan(full.out().length / 3);
  });
  it('check --html OUT --no-trace writes the summary; --no-trace alone is a usage error (exit 2)', { timeout: 60_000 }, async () => {
    const file = presetFiles().find((x) => x.includes('coal-room'))!;
    const f = fakeIo();
    await run(['check', file, '--html', 'out.html', '--no-trace'], f.io);
    expect(f.written['out.html']).toContain('lr-section-checks');
    expect(f.written['out.html']).not.toContain('lr-section-trace');
    const g = fakeIo();
    expect(await run(['check', file, '--no-trace'], g.io)).toBe(2);
    expect(g.err()).toContain('--no-trace');
  });
  it('no command is a usage error (exit 2) that still shows the usage', async () => {
    const f = fakeIo();
    expect(await run([], f.io)).toBe(2);
    expect(f.out()).toContain('Usage');
  });
  it('an unknown option exits 2 naming it', async () => {
    const f = fakeIo();
    expect(await run(['check', 'x.json', '--frobnicate'], f.io)).toBe(2);
    expect(f.err()).toContain('--frobnicate');
  });
  it('check --json prints a lamina-report/2 report without NaN or Infinity', async () => {
    for (const file of presetFiles()) {
      const f = fakeIo();
      const code = await run(['check', file, '--json'], f.io);
      expect([0, 1]).toContain(code);
      const text = f.out();
      expect(text).not.toMatch(/NaN|Infinity/);
      const report = JSON.parse(text);
      expect(report.schema).toBe('lamina-report/2');
      expect(report.layers.length).toBeGreaterThan(0);
      expect(Object.keys(report.maxSpan_m)).toEqual(['tension', 'crushing', 'sliding', 'snapThrough', 'deflection', 'governing']);
    }
    }, 60_000);
  it('exit code 1 when a check is below target and 0 when all meet (one thick bed, low targets)', async () => {
    const below = fakeIo({ 'p.json': JSON.stringify(example) });
    expect(await run(['check', 'p.json'], below.io)).toBe(1);
    const safe = structuredClone(example);
    // One 0.8 m bed over 4 m: tension q s²/(2t²) ≈ 0.25 MPa; sliding s·tanφ/(4z) ≈ 4·0.70/(4·0.4) ≈ 1.75.
    safe.opening.span_m = 4.0;
    safe.layers = [safe.layers[0]];
    safe.layers[0].thickness_m = 0.8;
    safe.design.fsTarget = { tension: 1.0, crushing: 1.2, sliding: 1.0 };
    const ok = fakeIo({ 'p.json': JSON.stringify(safe) });
    expect(await run(['check', 'p.json'], ok.io), ok.out()).toBe(0);
  });
  it('human output gives units on the numbers and the caution', async () => {
    const f = fakeIo();
    await run(['check', presetFiles()[0]], f.io);
    const text = f.out();
    expect(text).toContain(CAUTION);
    expect(text).toMatch(/span \d+(\.\d+)? m/);
    expect(text).toMatch(/\d MPa/);
    const us = fakeIo();
    await run(['check', presetFiles()[0], '--units', 'US'], us.io);
    expect(us.out()).toMatch(/\d ft/);
    expect(us.out()).toMatch(/\d psi/);
  });
  it('an invalid project exits 2 with field paths on stderr and nothing on stdout', async () => {
    const bad = structuredClone(example);
    bad.layers[1].thickness_m = -0.2;
    bad.opening.span_m = 0;
    const f = fakeIo({ 'bad.json': JSON.stringify(bad) });
    expect(await run(['check', 'bad.json', '--json'], f.io)).toBe(2);
    expect(f.err()).toContain('layers[1].thickness_m');
    expect(f.err()).toContain('opening.span_m');
    expect(f.out()).toBe('');
  });
  it('malformed JSON and a missing file exit 2', async () => {
    const f = fakeIo({ 'x.json': '{ "schema": ' });
    expect(await run(['check', 'x.json'], f.io)).toBe(2);
    const g = fakeIo();
    expect(await run(['check', '/nonexistent/none.lamina.json'], g.io)).toBe(2);
    expect(g.err()).toContain('cannot read');
  });
  it('span prints the largest spans and the minimum thickness', async () => {
    const f = fakeIo();
    await run(['span', presetFiles()[0], '--json'], f.io);
    const r = JSON.parse(f.out());
    expect(r.maxSpan_m.governing).toBeGreaterThan(0);
    expect(r.minimumThickness.thickness_m === null || r.minimumThickness.thickness_m > 0).toBe(true);
    const h = fakeIo();
    await run(['span', presetFiles()[0]], h.io);
    expect(h.out()).toContain('Minimum thickness');
    expect(h.out()).toContain(CAUTION);
  });
  it('span: a layer whose thickness does not limit the design is said so, not given the search floor as its minimum', async () => {
    // the coal-room demo's sandstone (layer 2) meets every target at the floor of the thickness
    // search (minimumThickness gives 0.01 m)
    const coal = presetFiles().find((p) => p.includes('coal-room'))!;
    const f = fakeIo();
    await run(['span', coal, '--layer', '2'], f.io);
    expect(f.out()).toMatch(/Minimum thickness of layer 2 \(Channel sandstone\) at the current span: every thickness down to 0\.01 m \(the thinnest searched\) meets every target: its thickness does not limit this design \(now [\d.]+ m\)/);
    const g = fakeIo();
    await run(['span', coal, '--layer', '1'], g.io);
    expect(g.out()).toMatch(/Minimum thickness of layer 1 \(Laminated grey shale\) at the current span: \d+(\.\d+)? m \(now 0\.5 m\)/);
  });
  it('--csv writes the results table and the span curve, both parseable', async () => {
    const f = fakeIo();
    await run(['check', presetFiles()[0], '--csv', 'out.csv'], f.io);
    expect(Object.keys(f.written).sort()).toEqual(['out-span.csv', 'out.csv']);
    expect(csvParse(f.written['out.csv']).length).toBeGreaterThan(0);
    expect(csvParse(f.written['out-span.csv']).length).toBeGreaterThan(10);
  });
});

describe('lamina lab', () => {
  // Check value: METHODS §5 (ISRM 1978): P = 10 kN, D = 54 mm, L = 27 mm → 4.366 MPa; P = 20 kN → 8.733 MPa.
  const csv = 'id,diameter_mm,thickness_mm,peakLoad_kN,valid\nA,54,27,10,true\nB,54,27,20,yes\nC,54,60,12,true\nD,54,27,9,false\n';
  it('reduces Brazilian specimens and names rejected ones', async () => {
    const f = fakeIo({ 'lab.csv': csv });
    expect(await run(['lab', 'lab.csv', '--json'], f.io)).toBe(0);
    const r = JSON.parse(f.out());
    expect(r.specimens[0].brazilian_MPa).toBeCloseTo(4.366, 3);
    expect(r.specimens[1].brazilian_MPa).toBeCloseTo(8.733, 3);
    expect(r.specimens[2].accepted).toBe(false);
    expect(r.specimens[3].accepted).toBe(false);
    expect(r.accepted).toBe(2);
    // direct = 0.7 × mean Brazilian (Perras & Diederichs 2014): 0.7 × 6.5493 = 4.5845 MPa
    expect(r.directMean_MPa).toBeCloseTo(0.7 * (4.3663 + 8.7326) / 2, 3);
  });
  it('--rock igneous uses the 0.8 factor (Perras & Diederichs 2014)', async () => {
    const f = fakeIo({ 'lab.csv': csv });
    await run(['lab', 'lab.csv', '--rock', 'igneous', '--json'], f.io);
    expect(JSON.parse(f.out()).directFactor).toBe(0.8);
  });
  it('bad CSV rows exit 2 naming the row and the column', async () => {
    const f = fakeIo({ 'bad.csv': 'id,diameter_mm,thickness_mm,peakLoad_kN\nA,abc,27,10\n' });
    expect(await run(['lab', 'bad.csv'], f.io)).toBe(2);
    expect(f.err()).toMatch(/row 2/);
    expect(f.err()).toContain('diameter_mm');
  });
  it('an unknown rock class exits 2', async () => {
    const f = fakeIo({ 'lab.csv': csv });
    expect(await run(['lab', 'lab.csv', '--rock', 'basaltic'], f.io)).toBe(2);
  });
});

describe('npm run lamina', () => {
  it('builds and runs the CLI through the package script with the exit codes of DESIGN.md', async () => {
    const ok = spawnSync('npm', ['run', '-s', 'lamina', '--', 'check', presetFiles()[0], '--json'], { encoding: 'utf8' });
    expect([0, 1]).toContain(ok.status);
    expect(JSON.parse(ok.stdout).schema).toBe('lamina-report/2');
    const help = execFileSync('npm', ['run', '-s', 'lamina', '--', '--help'], { encoding: 'utf8' });
    expect(help).toContain('licensed engineer');
  }, 120_000);
});
