/**
 * Files on disk: atomic save (temp file beside the target, fsync, rename — retried where the
 * platform briefly holds the file, as Windows virus scanners do), a backup of the previous
 * version (`<file>.bak`), refusal to overwrite a file changed on disk since it was opened or
 * saved (size, mtime and SHA-256 compared), size-limited reads, the recent-files list and
 * the autosave recovery file. The fs functions are passed in for tests.
 */
import { createHash } from 'node:crypto';
import { promises as nodeFs } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { MAX_PROJECT_FILE_LENGTH } from '../core/project/project-file.ts';

export type Fs = Pick<typeof nodeFs, 'open' | 'rename' | 'rm' | 'readFile' | 'stat' | 'mkdir' | 'writeFile'>;

const RETRYABLE = new Set(['EPERM', 'EACCES', 'EBUSY']);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Writes `text` to `path` so that readers see the old file or the new one, never half of one. */
export async function atomicWrite(path: string, text: string | Uint8Array, fs: Fs = nodeFs, retries = 5): Promise<void> {
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.${Math.random().toString(36).slice(2)}.tmp`);
  try {
    const handle = await fs.open(tmp, 'w', 0o644);
    try {
      await handle.writeFile(text);
      await handle.sync();
    } finally {
      await handle.close();
    }
    for (let attempt = 0; ; attempt++) {
      try {
        await fs.rename(tmp, path);
        return;
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code ?? '';
        if (!RETRYABLE.has(code) || attempt >= retries) throw e;
        await sleep(20 * 2 ** attempt);
      }
    }
  } catch (e) {
    await fs.rm(tmp, { force: true }).catch(() => {});
    throw e;
  }
}

/** What a file on disk was when we last read or wrote it. */
export interface Fingerprint {
  readonly size: number;
  readonly mtimeMs: number;
  readonly sha256: string;
}

const sha256 = (data: string | Uint8Array) => createHash('sha256').update(data).digest('hex');

/** The fingerprint of `text` just written to (or read from) `path`; null when the file is gone. */
export async function fingerprintOf(path: string, text: string | Uint8Array, fs: Fs = nodeFs): Promise<Fingerprint | null> {
  try {
    const st = await fs.stat(path);
    return { size: st.size, mtimeMs: st.mtimeMs, sha256: sha256(text) };
  } catch {
    return null;
  }
}

/** Refusal to overwrite a file that changed on disk since it was opened or last saved. */
export class FileChangedError extends Error {
  constructor(readonly path: string) {
    super(`${path} was changed on disk since it was opened or last saved; saving now would overwrite those changes`);
    this.name = 'FileChangedError';
  }
}

/**
 * Whether the file still is what `expected` describes. Same size and mtime: unchanged. Otherwise
 * the content decides (a touched but identical file is not a conflict). A missing file is not
 * a conflict either (nothing to lose).
 */
async function unchangedSince(path: string, expected: Fingerprint, fs: Fs): Promise<{ same: boolean; old: Buffer | null }> {
  let st;
  try {
    st = await fs.stat(path);
  } catch {
    return { same: true, old: null };
  }
  const old = (await fs.readFile(path)) as Buffer;
  if (st.size === expected.size && st.mtimeMs === expected.mtimeMs) return { same: true, old };
  return { same: sha256(old) === expected.sha256, old };
}

/**
 * Saves a document: refuses (FileChangedError) when the file on disk is no longer the version
 * `expected` describes, unless `overwrite`; keeps the previous version as `<path>.bak`; then
 * writes atomically. Returns the new fingerprint, to pass as `expected` next time.
 */
export async function saveDocument(
  path: string,
  text: string,
  opts: { expected?: Fingerprint | undefined; overwrite?: boolean; fs?: Fs } = {},
): Promise<Fingerprint | null> {
  const fs = opts.fs ?? nodeFs;
  let old: Buffer | null;
  if (opts.expected && !opts.overwrite) {
    const r = await unchangedSince(path, opts.expected, fs);
    if (!r.same) throw new FileChangedError(path);
    old = r.old;
  } else {
    old = await (fs.readFile(path) as Promise<Buffer>).catch(() => null);
  }
  if (old) await atomicWrite(`${path}.bak`, old, fs);
  await atomicWrite(path, text, fs);
  await removeStaleTemps(path).catch(() => {});
  return fingerprintOf(path, text, fs);
}

/**
 * Removes temporary files that an earlier, killed save left beside `path`
 * (`.<name>.<pid>.<random>.tmp` whose process is gone). Temp files of live processes stay:
 * another window may be saving right now. Returns the names removed.
 */
export async function removeStaleTemps(
  path: string,
  dir: { readdir(p: string): Promise<string[]>; rm(p: string, o: { force: boolean }): Promise<void> } = nodeFs,
  alive: (pid: number) => boolean = processAlive,
): Promise<string[]> {
  const prefix = `.${basename(path)}.`;
  const removed: string[] = [];
  for (const name of await dir.readdir(dirname(path))) {
    if (!name.startsWith(prefix) || !name.endsWith('.tmp')) continue;
    const m = /^(\d+)\.[a-z0-9]+\.tmp$/.exec(name.slice(prefix.length));
    if (!m || alive(Number(m[1]))) continue;
    await dir.rm(join(dirname(path), name), { force: true });
    removed.push(name);
  }
  return removed;
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Reads a text file, refusing anything larger than a project file may be. */
export async function readTextFile(path: string, fs: Fs = nodeFs, limit = MAX_PROJECT_FILE_LENGTH): Promise<string> {
  const st = await fs.stat(path);
  if (st.size > limit * 4) throw new Error(`${path} is ${st.size} bytes, larger than a project file may be`);
  return fs.readFile(path, 'utf8');
}

/** The most recently opened or saved project files, newest first, kept in a small JSON file. */
export class RecentFiles {
  private list: string[] = [];
  constructor(
    private readonly store: string,
    private readonly fs: Fs = nodeFs,
    private readonly max = 10,
  ) {}
  async load(): Promise<readonly string[]> {
    try {
      const data: unknown = JSON.parse(await this.fs.readFile(this.store, 'utf8'));
      this.list = Array.isArray(data) ? data.filter((x): x is string => typeof x === 'string').slice(0, this.max) : [];
    } catch {
      this.list = [];
    }
    return this.list;
  }
  get files(): readonly string[] {
    return this.list;
  }
  has(path: string): boolean {
    return this.list.includes(path);
  }
  async add(path: string): Promise<void> {
    this.list = [path, ...this.list.filter((p) => p !== path)].slice(0, this.max);
    await this.fs.mkdir(dirname(this.store), { recursive: true });
    await atomicWrite(this.store, JSON.stringify(this.list, null, 2), this.fs);
  }
}

/** The autosave recovery file: written while there are unsaved changes, removed after a save. */
export class RecoveryFile {
  constructor(
    readonly path: string,
    private readonly fs: Fs = nodeFs,
  ) {}
  async write(text: string | null): Promise<void> {
    if (text === null) {
      await this.fs.rm(this.path, { force: true });
      return;
    }
    await this.fs.mkdir(dirname(this.path), { recursive: true });
    await atomicWrite(this.path, text, this.fs);
  }
  async read(): Promise<string | null> {
    try {
      return await readTextFile(this.path, this.fs);
    } catch {
      return null;
    }
  }
}
