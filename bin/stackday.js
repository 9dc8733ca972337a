#!/usr/bin/env node
// Launcher: runs the compiled CLI in dist/, built by `npm run build` (which `npm ci` and
// `npm install` run through the `prepare` script). For development without a build step,
// `npm run stackday -- ...` runs the TypeScript sources through tsx.
import { existsSync } from 'node:fs';

const compiled = new URL('../dist/cli/main.js', import.meta.url);
if (!existsSync(compiled)) {
  process.stderr.write('stackday: the compiled program (dist/) is missing: run `npm run build` in the package folder\n');
  process.exit(1);
}
const { runFromCommandLine } = await import(compiled.href);
await runFromCommandLine();
