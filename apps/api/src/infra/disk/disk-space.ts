import { Inject, Injectable } from '@nestjs/common';
import type { DiskSpaceDto } from '@benchproof/contracts';
import { statfs } from 'node:fs/promises';
import { dirname } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../../config';

const MB = 1024 * 1024;

/** Free bytes for an unprivileged writer on the filesystem holding `path` (statfs: available blocks × block size). */
async function freeBytes(path: string): Promise<number | null> {
  try {
    const s = await statfs(path);
    return s.bavail * s.bsize;
  } catch {
    return null;
  }
}

/**
 * Free space where the database and the uploads live, against DISK_LOW_MB, so
 * readiness and the manager's screen can warn before a full disk refuses writes.
 */
@Injectable()
export class DiskSpace {
  constructor(@Inject(APP_CONFIG) private readonly cfg: AppConfig) {}

  async check(): Promise<DiskSpaceDto> {
    const threshold = this.cfg.DISK_LOW_MB * MB;
    const place = async (path: string) => {
      const free = await freeBytes(path);
      return { freeBytes: free, low: free !== null && free < threshold };
    };
    const [database, uploads] = await Promise.all([place(dirname(this.cfg.DATABASE_PATH)), place(this.cfg.UPLOADS_DIR)]);
    return { low: database.low || uploads.low, thresholdBytes: threshold, database, uploads };
  }
}
