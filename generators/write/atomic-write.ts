import { closeSync, fsyncSync, openSync, renameSync, rmSync, writeSync, mkdirSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

/** Test hook: runs after the temporary file is written and synced, before the rename (throw to simulate a crash). */
export type BeforeRename = (tempPath: string, finalPath: string) => void;

/**
 * Replaces `path` with `text` atomically: writes a temporary file `.<name>.<pid>-<n>.tmp` in the same folder,
 * fsyncs it, renames it over the target and fsyncs the folder, so a reader (or a crash at any moment) sees either
 * the old bytes or the new bytes, never a mix. On an error the temporary file is removed and the target untouched.
 */
export function writeFileAtomic(path: string, text: string, beforeRename?: BeforeRename): void {
  const dir = dirname(path);
  mkdirSync(dir, { recursive: true });
  const temp = join(dir, `.${basename(path)}.${process.pid}-${counter++}.tmp`);
  try {
    const fd = openSync(temp, 'w', 0o644);
    try {
      writeSync(fd, text, null, 'utf8');
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    beforeRename?.(temp, path);
    renameSync(temp, path);
  } catch (error) {
    rmSync(temp, { force: true });
    throw error;
  }
  syncFolder(dir);
}

let counter = 0;

function syncFolder(dir: string): void {
  let fd: number | undefined;
  try {
    fd = openSync(dir, 'r');
    fsyncSync(fd);
  } catch {
    // Some file systems refuse fsync on a folder; the rename is still atomic there.
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}
