import { readdir, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';

/**
 * Finds files a crash can leave behind under UPLOADS_DIR: `*.partial` (a storage write cut
 * off before its rename) anywhere but the tus folder, and everything in the multipart temp
 * folder. Stored objects are never matched: a `.partial` name can never be a storage key
 * (assertSafeKey allows one extension), and nothing is stored under tmp/.
 * `olderThan` null means "all" (at boot, when no upload or task of this process is live).
 */
export async function removeLeftovers(root: string, dirs: { multipart: string; resumable: string }, olderThan: Date | null): Promise<string[]> {
  const removed: string[] = [];
  const stale = async (path: string) => olderThan === null || (await stat(path)).mtime < olderThan;
  const walk = async (dir: string, everything: boolean): Promise<void> => {
    const entries = await readdir(dir, { withFileTypes: true }).catch(() => []);
    for (const e of entries) {
      const path = join(dir, e.name);
      if (e.isDirectory()) {
        if (path !== dirs.resumable) await walk(path, everything || path === dirs.multipart);
      } else if ((everything || e.name.endsWith('.partial')) && (await stale(path))) {
        await rm(path, { force: true });
        removed.push(path);
      }
    }
  };
  await walk(root, root === dirs.multipart);
  return removed;
}
