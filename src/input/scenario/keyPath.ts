/**
 * Key paths: one value of a scenario addressed in text, as messages print it
 * (`stack.layers[1].thickness`), and back again. The inverse of `formatPath` (errors.ts).
 */

/** A key path as keys and list indices: `stack.layers[1].thickness` → ['stack', 'layers', 1, 'thickness']. */
export type KeyPath = readonly (string | number)[];

const SEGMENT = /^(?:\.?([A-Za-z_][A-Za-z0-9_]*)|\[(\d+)\])/;

/**
 * Parse `stack.layers[1].thickness` into keys and indices; null when the text is not a key path
 * (keys are letters, digits and underscores; indices whole numbers in brackets; no leading dot).
 */
export function parseKeyPath(text: string): KeyPath | null {
  const path: (string | number)[] = [];
  let rest = text.trim();
  if (rest === '' || rest.startsWith('.') || rest.startsWith('[')) return null;
  while (rest.length > 0) {
    const m = SEGMENT.exec(rest);
    if (!m) return null;
    if (m[1] !== undefined) {
      // a dot is required between two keys
      if (path.length > 0 && !m[0].startsWith('.')) return null;
      path.push(m[1]);
    } else path.push(Number(m[2]));
    rest = rest.slice(m[0].length);
  }
  return path;
}

/** Whether a key of a mapping is written as a key path (holds a dot or a bracket) rather than as one key. */
export function looksLikeKeyPath(key: string): boolean {
  return /[.[]/.test(key);
}

/** The value at a key path of a plain object (undefined when any step is missing). */
export function valueAtPath(root: unknown, path: KeyPath): unknown {
  let v: unknown = root;
  for (const p of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<string | number, unknown>)[p];
  }
  return v;
}
