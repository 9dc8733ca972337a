/**
 * The folders show the layers, and no import runs backwards up the chain
 *   physics, solver → model → input → analysis → output → library entry → batch → cli
 * (a module may import from its own layer or from layers before it; physics and solver are
 * independent foundations and import neither each other nor anything above them). No two folders
 * import each other. Type-only imports count: a type is a dependency too.
 * Common practice for layered code; the test reads the import statements as text.
 */
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';

const SRC = resolve(__dirname, '../../src');

/** Rank of each top-level layer; equal ranks in different layers may not import each other. */
const LAYER_RANK: Record<string, number> = { physics: 0, solver: 0, model: 1, input: 2, analysis: 3, output: 4, 'index.ts': 5, batch: 5.5, cli: 6 };

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? walk(p) : p.endsWith('.ts') ? [p] : [];
  });
}

/** Relative import specifiers of a file (static, dynamic and type-only). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const out: string[] = [];
  const re = /(?:^|\n)\s*(?:import|export)\b[^'"]*?from\s*['"](\.{1,2}\/[^'"]+)['"]|import\(\s*['"](\.{1,2}\/[^'"]+)['"]\s*\)/g;
  for (let m = re.exec(text); m; m = re.exec(text)) out.push((m[1] ?? m[2])!);
  return out;
}

const layerOf = (file: string) => relative(SRC, file).split(sep)[0]!;
const folderOf = (file: string) => relative(SRC, dirname(file)) || '.';

const files = walk(SRC);
const edges = files.flatMap((from) => importsOf(from).map((spec) => ({ from, to: resolve(dirname(from), spec) })));

describe('architecture', () => {
  it('every source file sits in a known layer', () => {
    const unknown = files.filter((f) => !(layerOf(f) in LAYER_RANK));
    expect(unknown.map((f) => relative(SRC, f))).toEqual([]);
  });

  it('no import runs backwards up the chain physics/solver → model → input → analysis → output → cli', () => {
    const backwards = edges
      .filter(({ from, to }) => {
        const a = layerOf(from);
        const b = layerOf(to);
        if (a === b) return false;
        return LAYER_RANK[b]! >= LAYER_RANK[a]!;
      })
      .map(({ from, to }) => `${relative(SRC, from)} → ${relative(SRC, to)}`);
    expect(backwards).toEqual([]);
  });

  it('no two folders import each other', () => {
    const pairs = new Set(edges.map(({ from, to }) => `${folderOf(from)}|${folderOf(to)}`));
    const mutual = [...pairs]
      .map((p) => p.split('|') as [string, string])
      .filter(([a, b]) => a < b && pairs.has(`${b}|${a}`))
      .map(([a, b]) => `${a} ⇄ ${b}`);
    expect(mutual).toEqual([]);
  });

  it('every import resolves to a file that exists', () => {
    const missing = edges.filter(({ to }) => !files.includes(to)).map(({ from, to }) => `${relative(SRC, from)} → ${relative(SRC, to)}`);
    expect(missing).toEqual([]);
  });
});
