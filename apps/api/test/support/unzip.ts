import { buffer } from 'node:stream/consumers';
import yauzl from 'yauzl';

/** Every entry of a zip held in memory, in order, with its bytes (test-sized zips only). */
export function unzipAll(zip: Buffer): Promise<{ name: string; data: Buffer }[]> {
  return new Promise((resolve, reject) => {
    yauzl.fromBuffer(zip, { lazyEntries: true }, (err, z) => {
      if (err) return reject(err);
      const out: { name: string; data: Buffer }[] = [];
      z.on('entry', (e: yauzl.Entry) =>
        z.openReadStream(e, (err2, s) => {
          if (err2) return reject(err2);
          buffer(s).then((data) => {
            out.push({ name: e.fileName, data });
            z.readEntry();
          }, reject);
        }),
      );
      z.on('end', () => resolve(out)).on('error', reject);
      z.readEntry();
    });
  });
}
