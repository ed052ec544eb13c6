import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { reportFileName } from '../../../src/ui/results/report-file-name';

describe('reportFileName(title)', () => {
  it('appends -report.html to the title', () => {
    expect(reportFileName('Coal room 3')).toBe('Coal room 3-report.html');
  });
  it('replaces characters that file systems refuse', () => {
    expect(reportFileName('a/b:c*<img src=x>')).toBe('a-b-c-img src=x-report.html');
  });
  it('falls back to "lamina" for an empty title', () => {
    expect(reportFileName('   ')).toBe('lamina-report.html');
  });
  it('property: never contains a path separator or a reserved character', () => {
    fc.assert(
      fc.property(fc.string(), (t) => {
        expect(reportFileName(t)).not.toMatch(/[\\/:*?"<>|\u0000-\u001f]/);
        expect(reportFileName(t).endsWith('-report.html')).toBe(true);
      }),
    );
  });
});
