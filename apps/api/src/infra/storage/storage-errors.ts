import type { Storage } from './storage';

/** Failed storage operations since start, by operation and error code (the metrics endpoint reads them). */
export const storageErrorCounts = new Map<string, number>();

const countError = (op: string, err: unknown): void => {
  const code = (err as { code?: unknown; name?: unknown } | null)?.code ?? (err as { name?: unknown } | null)?.name;
  const key = `${op}\u0000${typeof code === 'string' ? code : 'unknown'}`;
  storageErrorCounts.set(key, (storageErrorCounts.get(key) ?? 0) + 1);
};

/** [operation, code, count] rows for a scrape. */
export const storageErrorRows = (): [string, string, number][] =>
  [...storageErrorCounts].map(([k, n]) => {
    const [op, code] = k.split('\u0000');
    return [op, code, n];
  });

/**
 * The same store, counting every failed operation (a full disk, a refused bucket, a broken read stream). A read of
 * a key that is not there is a normal answer of `stat` (null), so it is not counted; a read stream's error is.
 */
export function countingStorage(inner: Storage): Storage {
  const watch =
    <A extends unknown[], R>(op: string, fn: (...a: A) => Promise<R>) =>
    (...a: A): Promise<R> =>
      fn(...a).catch((err: unknown) => {
        countError(op, err);
        throw err;
      });
  return {
    put: watch('put', inner.put.bind(inner)),
    adoptLocalFile: watch('adopt', inner.adoptLocalFile.bind(inner)),
    stat: watch('stat', inner.stat.bind(inner)),
    delete: watch('delete', inner.delete.bind(inner)),
    list: watch('list', inner.list.bind(inner)),
    createReadStream: (key, range) => inner.createReadStream(key, range).once('error', (err) => countError('read', err)),
  };
}
