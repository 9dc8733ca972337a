/**
 * The Chromium that the report test drives through playwright-core, found in this order:
 *
 * 1. `STACKDAY_CHROMIUM`: the path of a Chromium or Chrome executable. An explicit choice that does
 *    not exist is an error, not a reason to fall back.
 * 2. `/usr/bin/chromium` (Debian's chromium package) where it exists.
 * 3. The headless Chromium build that the `@sparticuz/chromium` package (a dev dependency) ships
 *    inside its tarball, as brotli-compressed files. The first run unpacks it (about 190 MB, a few
 *    seconds) into `<tmpdir>/stackday-chromium-<package version>/`; later runs reuse it. It is
 *    unpacked into a fresh folder that is renamed into place when complete, so an interrupted or
 *    concurrent run never leaves a half-written browser where another run would take it.
 *
 * No download, no install script: `npm ci` alone provides the third choice on any x64 Linux.
 */
import { existsSync, mkdtempSync, readFileSync, renameSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';

export const CHROMIUM_ENV = 'STACKDAY_CHROMIUM';
const DEBIAN_CHROMIUM = '/usr/bin/chromium';

/**
 * Launch arguments that suit both Debian's Chromium and the packaged headless build when run as
 * root in a container: no sandbox (root, no user namespaces), no GPU, and nothing that talks to the
 * network on its own (the report test asserts that the page fetches nothing).
 */
export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

export interface FoundChromium {
  readonly executablePath: string;
  /** Where it came from, for messages. */
  readonly source: string;
}

/** The Chromium to launch (see the file comment for the order). */
export async function findChromium(): Promise<FoundChromium> {
  const chosen = process.env[CHROMIUM_ENV];
  if (chosen) {
    if (!existsSync(chosen)) throw new Error(`${CHROMIUM_ENV}=${chosen}: no such file; unset it to use ${DEBIAN_CHROMIUM} or the packaged headless Chromium`);
    return { executablePath: chosen, source: `${CHROMIUM_ENV}` };
  }
  if (existsSync(DEBIAN_CHROMIUM)) return { executablePath: DEBIAN_CHROMIUM, source: "Debian's chromium" };
  return { executablePath: await unpackPackagedChromium(), source: '@sparticuz/chromium' };
}

/** Unpack the packaged headless Chromium once per package version; returns the executable's path. */
async function unpackPackagedChromium(): Promise<string> {
  const require = createRequire(import.meta.url);
  // the package exports no ./package.json: find it from the CommonJS entry (build/cjs/index.cjs)
  const root = join(dirname(require.resolve('@sparticuz/chromium')), '..', '..');
  const { version } = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string };
  const home = join(tmpdir(), `stackday-chromium-${version}`);
  const executable = join(home, 'chromium');
  if (existsSync(executable)) return executable;

  // The package unpacks into os.tmpdir() (chromium, fonts/, the SwiftShader libraries), so point
  // TMPDIR at a fresh folder for the duration of the call.
  const staging = mkdtempSync(`${home}.partial-`);
  const savedTmpdir = process.env.TMPDIR;
  try {
    process.env.TMPDIR = staging;
    const { default: Chromium } = await import('@sparticuz/chromium');
    const unpacked = await Chromium.executablePath(join(root, 'bin'));
    if (unpacked !== join(staging, 'chromium')) throw new Error(`@sparticuz/chromium unpacked to ${unpacked}, expected ${join(staging, 'chromium')}`);
  } catch (e) {
    rmSync(staging, { recursive: true, force: true });
    throw e;
  } finally {
    if (savedTmpdir === undefined) delete process.env.TMPDIR;
    else process.env.TMPDIR = savedTmpdir;
  }
  try {
    renameSync(staging, home);
  } catch (e) {
    // another run finished first: use its copy
    rmSync(staging, { recursive: true, force: true });
    if (!existsSync(executable)) throw e;
  }
  return executable;
}
