/** The README's model description is generated from the correlation registry and cannot drift from it. */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { correlationsInUse, withCorrelationBlock } from '../../src/output/modelDescription.ts';
import { CORRELATIONS_IN_USE } from '../../src/model/correlations.ts';
import { CORRELATIONS } from '../../src/physics/correlations/registry.ts';

describe('model description', () => {
  it('README.md carries the current list of correlations in use (run `npm run docs` after changing the registry)', () => {
    const readme = readFileSync('README.md', 'utf8');
    expect(withCorrelationBlock(readme)).toBe(readme);
  });

  it('names every role once, with its registry entry\'s source', () => {
    const lines = correlationsInUse();
    expect(lines).toHaveLength(Object.keys(CORRELATIONS_IN_USE).length);
    for (const [i, name] of Object.values(CORRELATIONS_IN_USE).entries()) expect(lines[i]!.text).toContain(CORRELATIONS[name].source);
  });
});
