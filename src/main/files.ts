/**
 * Files on disk: atomic save (temp file beside the target, fsync, rename — retried where the
 * platform briefly holds the file, as Windows virus scanners do), size-limited reads, the
 * recent-files list and the autosave recovery file. The fs functions are passed in for tests.
 */
import { promises as nodeFs } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { MAX_PROJECT_FILE_LENGTH } from '../core/project/project-file.ts';

export type Fs = Pick<typeof nodeFs, 'open' | 'rename' | 'rm' | 'readFile' | 'stat' | 'mkdir' | 'writeFile'>;

const RETRYABLE = new Set(['EPERM', 'EACCES', 'EBUSY']);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Writes `text` to `path` so that readers see the old file or the new one, never half of one. */
export async function atomicWrite(path: string, text: string, fs: Fs = nodeFs, retries = 5): Promise<void> {
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.${Math.random().toString(36).slice(2)}.tmp`);
  try {
    const handle = await fs.open(tmp, 'w', 0o644);
    try {
      await handle.writeFile(text, 'utf8');
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
