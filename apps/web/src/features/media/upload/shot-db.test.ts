import 'fake-indexeddb/auto';
import { newItem } from './queue';
import { forgetShot, forgetUser, openShotDb, retagShot, saveShot, shotsOf } from './shot-db';

const tags = { phase: 'before', area: 'brakes', caption: 'Front pads' } as const;
const shot = (name: string, bytes: number[], type = 'image/jpeg') => newItem(7, new File([new Uint8Array(bytes)], name, { type }), { ...tags });

describe('waiting shots kept in IndexedDB (fake-indexeddb stands in for the browser)', () => {
  let n = 0;
  const freshDb = () => openShotDb(`test-shots-${++n}`);

  it('gives back one user’s shots after a "reload", in the order taken, with bytes, tags and client id, queued again', async () => {
    const db = await freshDb();
    const a = shot('a.jpg', [1, 2, 3]);
    const b = shot('b.mp4', [9, 9], 'video/mp4');
    await saveShot(db, 5, b, 2);
    await saveShot(db, 5, a, 1);
    db.close();
    const reopened = await openShotDb(`test-shots-${n}`);
    const back = await shotsOf(reopened, 5);
    expect(back.map((i) => [i.id, i.clientId, i.file.name, i.file.type, i.status, i.transport])).toEqual([
      [a.id, a.clientId, 'a.jpg', 'image/jpeg', 'queued', 'form'],
      [b.id, b.clientId, 'b.mp4', 'video/mp4', 'queued', 'tus'],
    ]);
    expect([...new Uint8Array(await back[0].file.arrayBuffer())]).toEqual([1, 2, 3]);
    expect(back[0].tags).toEqual(tags);
  });

  it('never shows one user’s shots to another, and deleting a user’s shots leaves the other’s', async () => {
    const db = await freshDb();
    await saveShot(db, 5, shot('mine.jpg', [1]), 1);
    await saveShot(db, 6, shot('theirs.jpg', [2]), 2);
    expect((await shotsOf(db, 6)).map((i) => i.file.name)).toEqual(['theirs.jpg']);
    await forgetUser(db, 5);
    expect(await shotsOf(db, 5)).toEqual([]);
    expect((await shotsOf(db, 6)).map((i) => i.file.name)).toEqual(['theirs.jpg']);
  });

  it('follows a retag and forgets a stored shot', async () => {
    const db = await freshDb();
    const a = shot('a.jpg', [1]);
    const b = shot('b.jpg', [2]);
    await saveShot(db, 5, a, 1);
    await saveShot(db, 5, b, 2);
    await retagShot(db, a.id, { phase: 'after', area: 'drivetrain', caption: 'Chain' });
    await forgetShot(db, b.id);
    const back = await shotsOf(db, 5);
    expect(back.map((i) => [i.file.name, i.tags.phase, i.tags.caption])).toEqual([['a.jpg', 'after', 'Chain']]);
  });
});
