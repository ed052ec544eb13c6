/**
 * End-to-end tests of the built `lamina` command (plain node, no TypeScript loader): several
 * files, patterns, standard input, the summary line, the worst exit code, the batch of
 * openings with bad rows, unwritable output paths, the library entry, and that mathjs is not
 * loaded at start-up. The expected numbers come from the in-process analysis (consistency);
 * the analysis itself is checked against published values in test/analysis.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { spawnSync } from 'node:child_process';
import { csvParse } from 'd3';
import { CAUTION } from '../../src/model/caution';
import { analyseProject, meetsTargets } from '../../src/analysis';
import { readProjectText } from '../../src/model/project-file';
import { presetFiles } from '../analysis/fixtures';
import { buildNode, ROOT } from './built-cli';

let out = '';
let work = '';
const lamina = (args: string[], input?: string) => {
  const r = spawnSync(process.execPath, [join(out, 'lamina.js'), ...args], { cwd: ROOT, encoding: 'utf8', input, timeout: 120_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
};

const coal = presetFiles().find((f) => f.includes('coal-room'))!;
const coalText = readFileSync(coal, 'utf8');
/** One 0.8 m bed over 4 m with low targets: meets every check (see test/cli/cli.test.ts). */
function safeProjectText(): string {
  const p = JSON.parse(coalText);
  p.opening.span_m = 4.0;
  p.layers = [p.layers[0]];
  p.layers[0].thickness_m = 0.8;
  p.design.fsTarget = { tension: 1.0, crushing: 1.2, sliding: 1.0 };
  return JSON.stringify(p);
}

beforeAll(async () => {
  out = await buildNode();
  work = mkdtempSync(join(tmpdir(), 'lamina-cli-'));
}, 180_000);
afterAll(() => {
  for (const dir of [out, work]) if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the built lamina command', () => {
  it('starts with plain node: --help carries the caution and documents the exit codes 0–3', () => {
    const r = lamina(['--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain(CAUTION);
    expect(r.stdout).toMatch(/3 an internal error/);
    expect(readFileSync(join(out, 'lamina.js'), 'utf8').startsWith('#!/usr/bin/env node')).toBe(true);
  });

  it('several files in one call: one report each, a summary line on stderr, exit code the worst (2 > 1 > 0)', () => {
    const safe = join(work, 'safe.lamina.json');
    writeFileSync(safe, safeProjectText());
    const bad = join(work, 'bad.lamina.json');
    writeFileSync(bad, JSON.stringify({ ...JSON.parse(coalText), opening: { type: 'beam', span_m: -1, ends: 'clamped' } }));
    expect(lamina(['check', safe]).code).toBe(0);
    const twoGood = lamina(['check', safe, coal]);
    expect(twoGood.code).toBe(1); // the coal room is below its targets
    expect(twoGood.stdout.split(CAUTION).length - 1).toBe(4); // two reports, the caution twice in each
    expect(twoGood.stderr).toContain('lamina: 2 files checked: 1 meets the targets, 1 below, 0 refused');
    const withBad = lamina(['check', safe, bad, coal, '--jsonl']);
    expect(withBad.code).toBe(2);
    expect(withBad.stderr).toContain('opening.span_m');
    expect(withBad.stderr).toContain('3 files checked: 1 meets the targets, 1 below, 1 refused');
    const lines = withBad.stdout.trim().split('\n').map((l) => JSON.parse(l));
    expect(lines.map((l) => [l.file, l.status, l.exit])).toEqual([[safe, 'meets', 0], [bad, 'refused', 2], [coal, 'below', 1]]);
    expect(lines[1].errors.some((e: { path: string }) => e.path === 'opening.span_m')).toBe(true);
    // The report in the JSON Lines is the same report as the in-process analysis of the file.
    expect(lines[2].report).toEqual(JSON.parse(JSON.stringify(analyseProject(readProjectText(coalText).project))));
  }, 120_000);

  it('expands a quoted pattern itself, and --json gives an array with one entry per file', () => {
    const expected = readdirSync(join(ROOT, 'presets')).filter((f) => f.endsWith('.lamina.json')).sort().map((f) => `presets/${f}`);
    const r = lamina(['check', 'presets/*.lamina.json', '--json']);
    const entries = JSON.parse(r.stdout) as { file: string; exit: number; report: { schema: string } }[];
    expect(entries.map((e) => e.file)).toEqual(expected);
    expect(entries.every((e) => e.report.schema === 'lamina-report/2')).toBe(true);
    expect(r.code).toBe(Math.max(...entries.map((e) => e.exit)));
    expect(r.stderr).toContain(`${expected.length} files checked`);
    const none = lamina(['check', 'presets/*.nothing']);
    expect(none.code).toBe(2);
    expect(none.stderr).toContain('no file matches this pattern');
  }, 120_000);

  it('- reads the project from standard input', () => {
    const r = lamina(['check', '-', '--json'], coalText);
    const project = readProjectText(coalText).project;
    const report = analyseProject(project);
    expect(r.code).toBe(meetsTargets(project, report) ? 0 : 1);
    expect(JSON.parse(r.stdout)).toEqual(JSON.parse(JSON.stringify(report)));
    expect(lamina(['check', '-', '-']).code).toBe(2); // standard input can be read once
  }, 60_000);

  it('an unwritable --csv or --html path exits 2 naming the option and the path (not an internal error)', () => {
    const missing = join(work, 'no-such-dir', 'out.csv');
    const r = lamina(['check', coal, '--csv', missing]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`--csv ${missing}`);
    expect(r.stderr).toContain('its directory does not exist');
    const dir = lamina(['check', coal, '--html', work]);
    expect(dir.code).toBe(2);
    expect(dir.stderr).toContain(`--html ${work}`);
    expect(dir.stderr).toContain('it is a directory');
    expect(dir.stderr).not.toContain('internal error');
  }, 60_000);

  it('plain check loads no mathjs: it is only in chunks imported on demand (the calculation report)', () => {
    const staticImports = (file: string, seen = new Set<string>()): Set<string> => {
      if (seen.has(file)) return seen;
      seen.add(file);
      const text = readFileSync(file, 'utf8');
      // Static imports only (`import … from "./x.js"`), not `import("./x.js")`.
      for (const m of text.matchAll(/(?:^|[;\n}])\s*import\s*(?:[^"'();]*?from\s*)?["'](\.[^"']+)["']/g)) staticImports(join(file, '..', m[1]), seen);
      return seen;
    };
    const chunksOf = (entry: string) => [...staticImports(join(out, entry))];
    const startUp = chunksOf('lamina.js');
    const check = [...new Set(startUp.concat(chunksOf(`chunks/${readdirSync(join(out, 'chunks')).find((f) => f.startsWith('check-'))!}`)))];
    const mathjs = /createUnitDependencies|parseDependencies|isValuelessUnit/;
    expect(startUp.length).toBeGreaterThan(1);
    for (const file of check) expect(mathjs.test(readFileSync(file, 'utf8')), file).toBe(false);
    // …and the report chunk does hold it (so the test above can fail).
    const all = readdirSync(join(out, 'chunks')).map((f) => join(out, 'chunks', f));
    expect(all.some((f) => mathjs.test(readFileSync(f, 'utf8')))).toBe(true);
    // --markdown still renders the trace formulas through the lazily loaded chunk.
    const md = lamina(['check', coal, '--markdown']);
    expect(md.stdout).toContain(CAUTION);
    expect(md.stdout).toMatch(/·/); // a rendered formula (multiplication dot)
  }, 60_000);

  it('the library entry imports from the build and analyses a preset as the source does', async () => {
    const lib = (await import(pathToFileURL(join(out, 'index.js')).href)) as typeof import('../../src/index');
    const { project } = lib.readProjectText(coalText);
    const report = lib.analyseProject(project);
    expect(report.schema).toBe('lamina-report/2');
    expect(report).toEqual(analyseProject(readProjectText(coalText).project));
    expect(lib.CAUTION).toBe(CAUTION);
    const reportLib = (await import(pathToFileURL(join(out, 'report.js')).href)) as typeof import('../../src/report');
    expect(typeof reportLib.renderMarkdown).toBe('function');
  }, 60_000);
});

describe('lamina openings (batch of openings)', () => {
  const table = [
    'name,type,span_m,length_m,ends,surcharge_kPa,notes',
    'Room 1,beam,4,,clamped,,first room', // row 2: good
    'Drift 2,beam,abc,,,,', // row 3: span not a number
    '"=HYPERLINK(""http://example.invalid"",""x"")",slab,5,8,simple,10,', // row 4: good, a formula-like name
    'Bench 4,arch,6,,,,', // row 5: unknown type
    ',beam,5,,,,', // row 6: no name
    'Room 6,beam,-2,,,,', // row 7: refused by the validator (span must be > 0)
    '"Room 7",cantilever,1.5,,,,', // row 8: good
    'Room 8,beam,"6,5",,,,', // row 9: decimal comma
  ].join('\n');

  it('writes one results row per good opening and refuses each bad row with its row and column; exit 2', () => {
    const csvPath = join(work, 'openings.csv');
    writeFileSync(csvPath, table);
    const outCsv = join(work, 'results.csv');
    const r = lamina(['openings', coal, csvPath, '--csv', outCsv, '--jsonl']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('row 3, column span_m');
    expect(r.stderr).toContain('row 5, column type');
    expect(r.stderr).toContain('row 6, column name');
    expect(r.stderr).toContain('row 7, column span_m');
    expect(r.stderr).toMatch(/row 9, column span_m: .*decimal point/);
    expect(r.stderr).toContain('columns ignored: notes');
    expect(r.stderr).toMatch(/8 openings: \d meets? the targets, \d below, 5 refused/);
    expect(r.stderr).not.toMatch(/\r/); // no progress line when stderr is not a terminal
    const rows = csvParse(readFileSync(outCsv, 'utf8'));
    expect(rows.map((x) => x.row)).toEqual(['2', '4', '8']);
    expect(rows[1].name).toBe('\'=HYPERLINK("http://example.invalid","x")'); // OWASP: neutralised with an apostrophe
    const jsonl = r.stdout.trim().split('\n').map((l) => JSON.parse(l));
    expect(jsonl.map((x) => x.row)).toEqual([2, 4, 8]);
    // Each row is the analysis of the strata file with that opening (consistency with `check`).
    const p = JSON.parse(coalText);
    p.opening = { type: 'slab', span_m: 5, length_m: 8, ends: 'simple' };
    p.loads.surcharge_kPa = 10;
    const project = readProjectText(JSON.stringify(p)).project;
    const report = analyseProject(project);
    expect(jsonl[1].governing.fs).toBe(report.governing!.fs);
    expect(jsonl[1].status).toBe(meetsTargets(project, report) ? 'meets' : 'below');
    expect(Number(rows[1].fs)).toBe(report.governing!.fs);
  }, 120_000);

  it('only good rows: the exit code is 1 when one is below, 0 when all meet; a bad header refuses the table', () => {
    const safe = join(work, 'safe-strata.lamina.json');
    writeFileSync(safe, safeProjectText());
    const good = join(work, 'good.csv');
    // Spans within this bed's largest span (4.6 m; sliding limits short spans, FS rising with span).
    writeFileSync(good, 'name,type,span_m\nA,beam,4\nB,beam,4.5\n');
    expect(lamina(['openings', safe, good]).code).toBe(0);
    writeFileSync(good, 'name,type,span_m\nA,beam,4\nB,beam,30\n'); // 30 m: far beyond this bed's largest span
    const r = lamina(['openings', safe, good, '--json']);
    expect(r.code).toBe(1);
    expect(JSON.parse(r.stdout).map((x: { status: string }) => x.status)).toEqual(['meets', 'below']);
    writeFileSync(good, 'name,type,span\nA,beam,3\n');
    const h = lamina(['openings', safe, good]);
    expect(h.code).toBe(2);
    expect(h.stderr).toContain('span_m or span_ft');
  }, 120_000);

  it('US columns are converted: span_ft 13.12336 is the 4 m room', () => {
    const us = join(work, 'us.csv');
    writeFileSync(us, `name,type,span_ft\nRoom,beam,${4 / 0.3048}\n`); // 1 ft = 0.3048 m (exact by definition)
    const r = lamina(['openings', coal, us, '--json']);
    expect(JSON.parse(r.stdout)[0].opening.span_m).toBeCloseTo(4, 12);
  }, 60_000);
});
