/**
 * Deeply nested input (issue 14 items 7 and 8): refused or accepted cleanly, never a stack
 * overflow, and a syntax error always has its line and column.
 */
import { describe, expect, it } from 'vitest';
import { ProjectError, validateProject } from '../../src/model/validate';
import { locateJsonError, readProjectText } from '../../src/model/project-file';
import { presetText } from '../report/fixtures';

const DEPTH = 100_000;

function refusal(text: string): ProjectError {
  try {
    readProjectText(text);
  } catch (err) {
    if (err instanceof ProjectError) return err;
    throw err;
  }
  throw new Error('accepted');
}

describe('deep nesting', () => {
  it('200,000 × "[" is refused with the line and column where the file ends', () => {
    const text = '['.repeat(200_000);
    expect(() => JSON.parse(text)).toThrow(SyntaxError);
    expect(locateJsonError(text)).toEqual({ position: 200_000, reason: 'unexpected end of the file (expected a value)' });
    expect(refusal(text).message).toContain('not valid JSON at line 1, column 200001 (position 200000)');
    const lines = `{\n "a":\n${'[\n'.repeat(50_000)}1,\n}`;
    expect(refusal(lines).message).toMatch(/^not valid JSON at line 50004, column 1 \(position \d+\): unexpected "}" \(expected a value\)$/);
  });

  it(`a ${DEPTH.toLocaleString('en-US')}-deep object under an unknown key is accepted with a warning, no crash`, () => {
    const project = JSON.parse(presetText('coal-room-shale')) as Record<string, unknown>;
    const text = JSON.stringify(project).replace(/^\{/, `{"notes":${'{"a":'.repeat(DEPTH)}1${'}'.repeat(DEPTH)},`);
    const r = readProjectText(text);
    expect(r.warnings.map((w) => w.path)).toContain('notes');
  });

  it(`a forbidden key ${DEPTH.toLocaleString('en-US')} levels down is refused with its full path`, () => {
    const project = JSON.parse(presetText('coal-room-shale')) as Record<string, unknown>;
    const text = JSON.stringify(project).replace(/^\{/, `{"notes":${'[{"a":'.repeat(DEPTH)}{"__proto__":1}${'}]'.repeat(DEPTH)},`);
    const err = refusal(text);
    expect(err.issues).toHaveLength(1);
    expect(err.issues[0].code).toBe('FORBIDDEN_KEY');
    expect(err.issues[0].path).toBe(`notes${'[0].a'.repeat(DEPTH)}.__proto__`);
  });

  it('validateProject on a deep array does not throw (iterative scan)', () => {
    let deep: unknown = 1;
    for (let k = 0; k < DEPTH; k++) deep = [deep];
    const r = validateProject({ schema: 'lamina/1', extra: deep });
    expect(r.ok).toBe(false); // refused for the missing fields, not for the depth
  });
});
