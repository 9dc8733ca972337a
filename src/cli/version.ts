/**
 * The tool's version for `stackday --version`, read from package.json without loading the library
 * (src/index.ts reads the same file, but importing it loads the model and the scenario schema).
 * `../../package.json` is the package root both from src/cli/ and from the compiled dist/cli/.
 */
import { readFileSync } from 'node:fs';

export const VERSION: string = (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
