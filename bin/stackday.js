#!/usr/bin/env node
// Launcher: runs the TypeScript CLI through tsx (a runtime dependency), so `npx stackday` works
// from a checkout without a build step.
import { register } from 'tsx/esm/api';

register();
const { runFromCommandLine } = await import('../src/cli/main.ts');
await runFromCommandLine();
