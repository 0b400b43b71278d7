import 'fake-indexeddb/auto';
import { newItem, queueReducer, type QueueAction, type QueueItem } from './queue';
import { ShotKeeper } from './shot-keeper';

const tags = { phase: 'before', area: 'brakes', caption: '' } as const;
const shot = (name: string) => newItem(7, new File([new Uint8Array([1, 2])], name, { type: 'image/jpeg' }), { ...tags });

/** What the upload store does: the keeper follows an action, then the reducer runs it. */
async function run(keeper: ShotKeeper, items: QueueItem[], action: QueueAction): Promise<QueueItem[]> {
  await keeper.follow(action, items);
  return queueReducer(items, action);
}

let n = 0;
/** A keeper over its own fresh database, with one kept shot per name. */
async function keeping(...names: string[]) {
  const dbName = `keeper-test-${++n}`;
  const keeper = new ShotKeeper(5, dbName);
  const items = names.map(shot);
  await keeper.save(items);
  return { keeper, items, reload: () => new ShotKeeper(5, dbName).load() };
}

describe('the keeper remembers a refusal across a reload (fake-indexeddb stands in for the browser)', () => {
  it('brings a refused shot back refused, with its reason, and a waiting one queued', async () => {
    const kept = await keeping('closed.jpg', 'later.jpg');
    const { keeper } = kept;
    let { items } = kept;
    items = await run(keeper, items, { type: 'failed', id: items[0].id, message: 'This job is closed.', retryable: false, now: 0, code: 'JOB_CLOSED' });
    await run(keeper, items, { type: 'failed', id: items[1].id, message: 'No connection', retryable: true, now: 0, offline: true });
    const back = await kept.reload();
    expect(back.map((i) => [i.file.name, i.status, i.error, i.errorCode])).toEqual([
      ['closed.jpg', 'failed', 'This job is closed.', 'JOB_CLOSED'],
      ['later.jpg', 'queued', null, null],
    ]);
  });

  it('forgets the refusal when the user presses Retry, and keeps a session-expired shot queued for the next sign-in', async () => {
    const kept = await keeping('wrong.jpg', 'expired.jpg');
    const { keeper } = kept;
    let { items } = kept;
    items = await run(keeper, items, { type: 'failed', id: items[0].id, message: 'Too large.', retryable: false, now: 0, code: 'FILE_TOO_LARGE' });
    items = await run(keeper, items, { type: 'failed', id: items[1].id, message: 'Please sign in.', retryable: false, now: 0, code: 'SESSION_EXPIRED' });
    await run(keeper, items, { type: 'retryNow', id: items[0].id });
    const back = await kept.reload();
    expect(back.map((i) => [i.file.name, i.status])).toEqual([
      ['wrong.jpg', 'queued'],
      ['expired.jpg', 'queued'],
    ]);
  });
});
