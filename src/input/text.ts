/**
 * Text files in, and text from them out to messages: a file is read only when it is of a
 * reasonable size and is UTF-8 text (a byte-order mark is dropped); binary data is summarised,
 * never echoed; text shown in messages is made printable.
 */
import { readFileSync, statSync } from 'node:fs';

// Unprintable: control (Cc), format (Cf: bidirectional overrides, zero-width…), surrogate (Cs),
// private-use (Co) and unassigned (Cn) code points, and U+FFFD (what invalid UTF-8 decodes to).
const UNPRINTABLE = /[\p{Cc}\p{Cf}\p{Cs}\p{Co}\p{Cn}\uFFFD]/gu;

/**
 * `text` safe to print on a terminal: unprintable code points as `\uXXXX` (`\n`, `\t` and `\r`
 * as such), cut to `max` characters with "…".
 * Example: printable('a\u001b[31mb') → 'a\\u001b[31mb'.
 */
export function printable(text: string, max = 60): string {
  const cut = text.length > max ? `${text.slice(0, max)}…` : text;
  return cut.replace(UNPRINTABLE, (ch) => {
    if (ch === '\n') return '\\n';
    if (ch === '\t') return '\\t';
    if (ch === '\r') return '\\r';
    return `\\u${ch.codePointAt(0)!.toString(16).padStart(4, '0')}`;
  });
}

/** `1.5 MB`, `800 kB`, `312 bytes`: a file size for messages (decimal units). */
export function describeSize(bytes: number): string {
  if (bytes >= 1e6) return `${(bytes / 1e6).toFixed(1)} MB`;
  if (bytes >= 1e3) return `${Math.round(bytes / 1e3)} kB`;
  return `${bytes} bytes`;
}

export type TextFileResult = { ok: true; text: string } | { ok: false; problem: string };

/** Bytes that are control characters other than tab, line feed, carriage return and form feed. */
function isControlByte(b: number): boolean {
  return b < 0x20 ? b !== 0x09 && b !== 0x0a && b !== 0x0d && b !== 0x0c : b === 0x7f;
}

/**
 * Read a UTF-8 text file of at most `maxBytes`, without its byte-order mark. On failure, `problem`
 * says why in words (no such file, a folder, too large, not text), never echoing the content.
 * `what` names the file for messages: "a scenario file".
 */
export function readTextFile(path: string, what: string, maxBytes: number): TextFileResult {
  let bytes: Buffer;
  try {
    const stat = statSync(path);
    if (stat.isDirectory()) return { ok: false, problem: 'it is a folder' };
    // a device or a pipe could be read forever (/dev/zero) or block (a FIFO)
    if (!stat.isFile()) return { ok: false, problem: `it is not a regular file; expected ${what}` };
    const size = stat.size;
    if (size > maxBytes)
      return { ok: false, problem: `it is ${describeSize(size)}; ${what} may be at most ${describeSize(maxBytes)} (a limit of stackday)` };
    bytes = readFileSync(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : code === 'ENOTDIR' ? 'a part of the path is a file, not a folder' : `${code ?? (e as Error).message}`;
    return { ok: false, problem: why };
  }
  if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)))
    return { ok: false, problem: `it is UTF-16 text; expected ${what} in UTF-8 (save it as UTF-8)` };
  let text: string;
  let invalid = false;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    invalid = true;
    text = new TextDecoder('utf-8').decode(bytes);
  }
  let bad = 0;
  let firstBadLine = 0;
  let line = 1;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x0a) line++;
    else if (c === 0xfffd ? invalid : c < 0x80 && isControlByte(c)) {
      bad++;
      if (firstBadLine === 0) firstBadLine = line;
    }
  }
  if (bad > 0) {
    const binary = bad > bytes.length / 100 || bytes.includes(0);
    return {
      ok: false,
      problem: binary
        ? `it is not text: ${bytes.length} bytes, ${bad} of them not printable UTF-8 (binary data?); expected ${what} in UTF-8 text`
        : `${bad} character${bad === 1 ? ' is' : 's are'} not printable UTF-8 text (the first on line ${firstBadLine}); expected ${what} in UTF-8 text (save it as UTF-8)`,
    };
  }
  return { ok: true, text: text.charCodeAt(0) === 0xfeff ? text.slice(1) : text };
}
