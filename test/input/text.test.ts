/** Text files in and text out to messages: sizes, encodings, and nothing unprintable echoed. */
import { describe, it, expect } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { printable, readTextFile, describeSize } from '../../src/input/text.ts';

const dir = mkdtempSync(join(tmpdir(), 'stackday-text-'));
const file = (name: string, content: string | Buffer) => {
  const p = join(dir, name);
  writeFileSync(p, content);
  return p;
};

describe('printable', () => {
  it('escapes control, format and replacement characters; keeps letters, symbols and units', () => {
    expect(printable('a\u001b[31mb')).toBe('a\\u001b[31mb');
    expect(printable('right\u202eleft')).toBe('right\\u202eleft'); // a bidirectional override (format character)
    expect(printable('bad\ufffd')).toBe('bad\\ufffd');
    expect(printable('x\ny\tz')).toBe('x\\ny\\tz');
    expect(printable('205 °C, 12 m³/h, Ørsted')).toBe('205 °C, 12 m³/h, Ørsted');
  });

  it('cuts long text', () => {
    expect(printable('x'.repeat(100), 10)).toBe(`${'x'.repeat(10)}…`);
  });
});

describe('readTextFile', () => {
  it('drops a byte-order mark', () => {
    expect(readTextFile(file('bom.txt', '\ufeffname: x'), 'a file', 100)).toEqual({ ok: true, text: 'name: x' });
  });

  it('refuses a file over the limit before reading it, saying both sizes', () => {
    expect(readTextFile(file('big.txt', 'x'.repeat(2000)), 'a file', 1000)).toEqual({ ok: false, problem: 'it is 2 kB; a file may be at most 1 kB (a limit of stackday)' });
  });

  it('says what is wrong with binary data, UTF-16 and a missing file, never echoing content', () => {
    const binary = readTextFile(file('bin', Buffer.from([0, 1, 2, 3, 0xff, 0xfe, 0x41])), 'a file', 100);
    expect(binary).toEqual({ ok: false, problem: 'it is not text: 7 bytes, 6 of them not printable UTF-8 (binary data?); expected a file in UTF-8 text' });
    expect(readTextFile(file('u16', Buffer.from('\ufeffname', 'utf16le')), 'a file', 100)).toMatchObject({ ok: false, problem: expect.stringMatching(/UTF-16/) });
    expect(readTextFile(join(dir, 'missing'), 'a file', 100)).toEqual({ ok: false, problem: 'no such file' });
  });

  it('describeSize uses decimal units', () => {
    expect([describeSize(312), describeSize(1500), describeSize(1_048_576)]).toEqual(['312 bytes', '2 kB', '1.0 MB']);
  });
});
