/** `npm run docs`: regenerate the README's list of correlations in use from the registry. */
import { readFileSync, writeFileSync } from 'node:fs';
import { withCorrelationBlock } from '../src/output/modelDescription.ts';

const before = readFileSync('README.md', 'utf8');
const after = withCorrelationBlock(before);
if (after !== before) writeFileSync('README.md', after);
console.log(after === before ? 'README.md is up to date' : 'README.md updated');
