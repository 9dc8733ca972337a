/** Key paths: the text messages print (`stack.layers[1].thickness`) read back into keys and indices, and printed again the same. */
import { describe, it, expect } from 'vitest';
import { parseKeyPath, looksLikeKeyPath, valueAtPath } from '../../../src/input/scenario/keyPath.ts';
import { formatPath } from '../../../src/input/scenario/errors.ts';

describe('parseKeyPath', () => {
  it('reads keys and list indices, and formatPath writes them back unchanged', () => {
    for (const text of ['stack.layers[1].thickness', 'surface.emissivity', 'flue.schedule.daily[3].gas_temperature', 'name', 'flue.schedule.per_day[0][2].time']) {
      const path = parseKeyPath(text);
      expect(path, text).not.toBeNull();
      expect(formatPath(path!)).toBe(text);
    }
    expect(parseKeyPath('stack.layers[1].thickness')).toEqual(['stack', 'layers', 1, 'thickness']);
  });

  it('refuses text that is not a key path: empty, a leading dot or bracket, a missing dot, spaces, a negative or unclosed index', () => {
    for (const text of ['', '.stack', '[1].a', 'stack..layers', 'stack layers', 'stack.layers[-1]', 'stack.layers[1', 'stack.layers[1]thickness', 'stack.']) expect(parseKeyPath(text), text).toBeNull();
  });

  it('tells a key path from a plain key, and reads the value at a path (undefined past a missing step)', () => {
    expect(looksLikeKeyPath('stack.layers[1].thickness')).toBe(true);
    expect(looksLikeKeyPath('surface')).toBe(false);
    const raw = { stack: { layers: [{ thickness: '50 mm' }, { thickness: '40 mm' }] } };
    expect(valueAtPath(raw, ['stack', 'layers', 1, 'thickness'])).toBe('40 mm');
    expect(valueAtPath(raw, ['stack', 'layers', 5, 'thickness'])).toBeUndefined();
    expect(valueAtPath(raw, ['site', 'name'])).toBeUndefined();
  });
});
