import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import S3rver from 's3rver';

export const TEST_BUCKET = 'benchproof-test';
const OBJECT_SUFFIX = '._S3rver_object';

export interface S3Fake {
  /** The environment that points the app at this fake (STORAGE=s3 and the S3_* settings). */
  env: Record<string, string>;
  /** Stored object keys as `/key`, read from the fake's folder (sync, like `filesUnder`). */
  keys: () => string[];
  close: () => Promise<void>;
}

/**
 * s3rver on loopback, on a free port, keeping its objects under `directory`; the bucket is made
 * before it listens. Credentials are s3rver's fixed pair.
 */
export async function startS3Fake(directory: string): Promise<S3Fake> {
  const server = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory, configureBuckets: [{ name: TEST_BUCKET }] });
  const { port } = await server.run();
  const bucketDir = join(directory, TEST_BUCKET);
  return {
    env: {
      STORAGE: 's3',
      S3_BUCKET: TEST_BUCKET,
      S3_REGION: 'us-east-1',
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_FORCE_PATH_STYLE: 'true',
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    },
    keys: () => objectKeys(bucketDir),
    close: () => server.close(),
  };
}

function objectKeys(bucketDir: string): string[] {
  const out: string[] = [];
  const walk = (d: string, rel: string) => {
    for (const name of readdirSync(d)) {
      if (name.startsWith('._S3rver_')) continue; // unfinished multipart uploads
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p, `${rel}/${name}`);
      else if (name.endsWith(OBJECT_SUFFIX)) out.push(`${rel}/${name.slice(0, -OBJECT_SUFFIX.length)}`);
    }
  };
  walk(bucketDir, '');
  return out.sort();
}
