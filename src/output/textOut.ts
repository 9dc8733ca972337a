/**
 * Where text files are written a piece at a time: to a file through a buffer (synchronous writes
 * of about a megabyte each, so a file of any size needs one buffer of memory), or to a string in
 * memory (for files a caller wants as text).
 */
import { closeSync, openSync, writeSync } from 'node:fs';

/** Receives the text of a file in pieces, in order. */
export interface TextOut {
  write(text: string): void;
}

/** Bytes gathered before they are written out: large enough that writes are few, small enough to be no burden. */
const CHUNK_BYTES = 1 << 20;

/**
 * A file written through a buffer with synchronous writes. `close` writes what is left and closes
 * the file; on an error the file is closed and the error thrown (the caller removes the file).
 */
export class BufferedFileWriter implements TextOut {
  private fd: number | null;
  private readonly buffer = Buffer.allocUnsafe(CHUNK_BYTES);
  private used = 0;
  /** Bytes written so far. */
  written = 0;

  constructor(readonly path: string) {
    this.fd = openSync(path, 'wx');
  }

  write(text: string): void {
    // a UTF-16 code unit takes at most 3 bytes in UTF-8
    if (this.used + 3 * text.length > CHUNK_BYTES) {
      this.flush();
      if (3 * text.length > CHUNK_BYTES) {
        this.writeOut(Buffer.from(text, 'utf8'));
        return;
      }
    }
    this.used += this.buffer.write(text, this.used, 'utf8');
  }

  private flush(): void {
    if (this.used === 0) return;
    const n = this.used;
    this.used = 0;
    this.writeOut(this.buffer.subarray(0, n));
  }

  private writeOut(bytes: Buffer): void {
    if (this.fd === null) return;
    let offset = 0;
    try {
      while (offset < bytes.length) offset += writeSync(this.fd, bytes, offset, bytes.length - offset);
    } catch (e) {
      this.abandon();
      throw e;
    }
    this.written += bytes.length;
  }

  /** Write what is buffered and close the file. */
  close(): void {
    this.flush();
    if (this.fd !== null) {
      const fd = this.fd;
      this.fd = null;
      closeSync(fd);
    }
  }

  /** Close the file without writing what is buffered (after a failure). */
  abandon(): void {
    this.used = 0;
    if (this.fd !== null) {
      const fd = this.fd;
      this.fd = null;
      try {
        closeSync(fd);
      } catch {
        // the file is being given up: a failure to close it changes nothing
      }
    }
  }
}

/** Text gathered in memory. */
export class StringOut implements TextOut {
  private readonly parts: string[] = [];
  write(text: string): void {
    this.parts.push(text);
  }
  text(): string {
    return this.parts.join('');
  }
}
