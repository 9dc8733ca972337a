/** The demo scenario shortened for batch tests (one day, hourly output, three segments), written as a file. */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';

const demo = parse(readFileSync('scenarios/demo.yaml', 'utf8'));

/** The shortened demo as a raw scenario object, changed by `edit`. */
export function shortDemo(edit: (s: any) => void = () => {}): any {
  const s = structuredClone(demo);
  s.run.days = 1;
  s.run.output_interval = 60;
  s.stack.segments = 3;
  edit(s);
  return s;
}

/** The shortened demo written to `dir/<name>.yaml`; returns the path. */
export function shortDemoFile(dir: string, name: string, edit: (s: any) => void = () => {}): string {
  const file = join(dir, `${name}.yaml`);
  writeFileSync(file, stringify(shortDemo(edit)));
  return file;
}
