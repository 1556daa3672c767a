/**
 * No lost work: a backup of the previous version on each save, no silent overwrite of a file
 * changed on disk since it was opened, and saves that survive the process being killed at
 * any moment (a child process saving a large project in a loop, SIGKILLed at random times:
 * the file is always the old or the new version, complete; the backup and the recovery file
 * too, and the recovery file restores the project).
 */
import { spawn } from 'node:child_process';
import { promises as fs } from 'node:fs';
import { mkdtemp, readdir, readFile, rm, utimes, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readProject } from '../../src/core/project/index.ts';
import { FileChangedError, fingerprintOf, RecoveryFile, saveDocument } from '../../src/main/files.ts';
import { stressProject, versionOf } from './fixtures/stress-project.ts';

let dir = '';
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'coppice-save-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('backup and changed-on-disk conflicts', () => {
  it('keeps the previous version as <file>.bak on each save', async () => {
    const p = join(dir, 'b.coppice.json');
    const fp1 = await saveDocument(p, 'one');
    expect(await readdir(dir)).not.toContain('b.coppice.json.bak');
    const fp2 = await saveDocument(p, 'two', { expected: fp1! });
    expect(await readFile(`${p}.bak`, 'utf8')).toBe('one');
    await saveDocument(p, 'three', { expected: fp2! });
    expect(await readFile(p, 'utf8')).toBe('three');
    expect(await readFile(`${p}.bak`, 'utf8')).toBe('two');
  });

  it('refuses to overwrite a file changed on disk since it was opened, and writes nothing', async () => {
    const p = join(dir, 'c.coppice.json');
    await writeFile(p, 'as opened');
    const opened = await fingerprintOf(p, 'as opened');
    await writeFile(p, 'edited elsewhere!');
    const err = await saveDocument(p, 'ours', { expected: opened! }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(FileChangedError);
    expect((err as Error).message).toMatch(/changed on disk since it was opened/);
    expect(await readFile(p, 'utf8')).toBe('edited elsewhere!');
    // After the user agrees: written, and the other version kept as the backup.
    await saveDocument(p, 'ours', { expected: opened!, overwrite: true });
    expect(await readFile(p, 'utf8')).toBe('ours');
    expect(await readFile(`${p}.bak`, 'utf8')).toBe('edited elsewhere!');
  });

  it('same size, different content, mtime restored: still a conflict (the hash decides)', async () => {
    const p = join(dir, 'd.coppice.json');
    const fp = await saveDocument(p, 'aaaa');
    await writeFile(p, 'bbbb');
    await utimes(p, new Date(fp!.mtimeMs + 5000), new Date(fp!.mtimeMs + 5000));
    await expect(saveDocument(p, 'cccc', { expected: fp! })).rejects.toBeInstanceOf(FileChangedError);
    // Touched but identical: not a conflict.
    await writeFile(p, 'aaaa');
    await expect(saveDocument(p, 'cccc', { expected: fp! })).resolves.toBeTruthy();
  });

  it('a file deleted since it was opened is simply written again', async () => {
    const p = join(dir, 'e.coppice.json');
    const fp = await saveDocument(p, 'x');
    await rm(p);
    await saveDocument(p, 'y', { expected: fp! });
    expect(await readFile(p, 'utf8')).toBe('y');
  });
});

describe('killed mid-save', () => {
  const GRAPHS = 10_000; // about 1.8 MB per version (the most a project may have)
  let script = '';
  beforeAll(async () => {
    script = join(dir, 'save-loop.mjs');
    await build({ entryPoints: ['test/main/fixtures/save-loop.ts'], bundle: true, platform: 'node', format: 'esm', outfile: script, logLevel: 'warning' });
  });

  /** Runs the save loop until `killAfterMs` after its first "saving", then SIGKILLs it; resolves with the last version reported. */
  function runAndKill(target: string, recovery: string, killAfterMs: number): Promise<{ saving: number; saved: number }> {
    const child = spawn(process.execPath, [script, target, recovery, String(GRAPHS)], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    let timer: NodeJS.Timeout | undefined;
    child.stdout.on('data', (d: Buffer) => {
      out += d.toString();
      if (!timer && out.includes('saving')) timer = setTimeout(() => child.kill('SIGKILL'), killAfterMs);
    });
    child.stderr.on('data', (d: Buffer) => (err += d.toString()));
    const guard = setTimeout(() => child.kill('SIGKILL'), 20_000);
    return new Promise((resolve, reject) => {
      child.on('exit', (_code, signal) => {
        clearTimeout(guard);
        if (signal !== 'SIGKILL') return reject(new Error(`child ended without being killed: ${err}`));
        const last = (re: RegExp) => Math.max(0, ...[...out.matchAll(re)].map((m) => Number(m[1])));
        resolve({ saving: last(/saving (\d+)/g), saved: last(/saved (\d+)/g) });
      });
    });
  }

  it('the target, its backup and the recovery file are always complete old or new versions', { timeout: 120_000 }, async () => {
    // Seeded kill times from 0 to 400 ms after the loop starts (a version takes some tens of ms).
    let seed = 12345;
    const rand = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    const target = join(dir, 'stress.coppice.json');
    const recovery = join(dir, 'recovery.coppice.json');
    const rounds = 12;
    let killedMidWrite = 0;
    // Keep killing (up to 30 rounds) until at least 4 kills landed mid-write: how many do depends
    // on the machine's speed, and the invariant below must be exercised in that window.
    for (let round = 0; round < 30 && (round < rounds || killedMidWrite < 4); round++) {
      const before = await readFile(target, 'utf8').then(versionOf, () => 0);
      const { saving, saved } = await runAndKill(target, recovery, Math.floor(rand() * 400));
      if (saving > saved) killedMidWrite++;
      const text = await readFile(target, 'utf8').catch(() => null);
      if (text === null) {
        // Killed before the very first save finished: there is nothing yet, not half a file.
        expect(before).toBe(0);
        expect(saved).toBe(0);
        continue;
      }
      const v = versionOf(text); // parses: never truncated
      expect(text).toBe(stressProject(v, GRAPHS));
      // The file is the last version saved, or the one being saved when it died.
      expect([saved, saving]).toContain(v);
      const bak = await readFile(`${target}.bak`, 'utf8').catch(() => null);
      if (bak !== null) expect(bak).toBe(stressProject(versionOf(bak), GRAPHS));
      const rec = await readFile(recovery, 'utf8');
      expect(rec).toBe(stressProject(versionOf(rec), GRAPHS));
    }
    expect(killedMidWrite).toBeGreaterThanOrEqual(4);
    // The app restores from the recovery file left by the last killed run.
    const rec = await new RecoveryFile(recovery, fs).read();
    expect(rec).not.toBeNull();
    const project = readProject(rec!);
    expect(project.graphs).toHaveLength(GRAPHS);
    expect(project.name).toMatch(/^stress v\d+$/);
  });
});

describe('temporary files left by a killed save', () => {
  it('are removed on the next save when their process is gone; live ones stay', async () => {
    const { removeStaleTemps } = await import('../../src/main/files.ts');
    const { mkdtemp, writeFile: wf, readdir } = await import('node:fs/promises');
    const { tmpdir: td } = await import('node:os');
    const d = await mkdtemp(join(td(), 'coppice-tmp-'));
    const target = join(d, 'p.coppice.json');
    await wf(target, '{}');
    await wf(join(d, '.p.coppice.json.999999.abc123.tmp'), 'half');
    await wf(join(d, `.p.coppice.json.${process.pid}.def456.tmp`), 'in progress');
    await wf(join(d, '.other.json.999999.abc123.tmp'), 'not ours');
    const removed = await removeStaleTemps(target, undefined, (pid) => pid === process.pid);
    expect(removed).toEqual(['.p.coppice.json.999999.abc123.tmp']);
    expect((await readdir(d)).sort()).toEqual(['.other.json.999999.abc123.tmp', `.p.coppice.json.${process.pid}.def456.tmp`, 'p.coppice.json'].sort());
  });
});
