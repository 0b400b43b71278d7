import { UploadMetaSchema } from '@benchproof/contracts';
import { tagFields } from './transports';
import { backoffMs, MAX_AUTO_ATTEMPTS, needsRetag, newItem, nextRetryAt, nextToStart, queueReducer, transportFor, type QueueItem } from './queue';

const tags = { phase: 'before', area: 'brakes', caption: '' } as const;
const file = (name: string, type = 'image/jpeg', size = 10) => new File([new Uint8Array(size)], name, { type });
const make = (n: number) => Array.from({ length: n }, (_, i) => newItem(7, file(`s${i}.jpg`), { ...tags }));
const fail = (items: QueueItem[], id: string, retryable: boolean, now = 1000) =>
  queueReducer(items, { type: 'failed', id, message: 'No connection', retryable, now });

describe('upload queue', () => {
  it('gives every shot its own client id, sent with its tags on every attempt, which the API schema accepts', () => {
    const items = make(50);
    expect(new Set(items.map((i) => i.clientId)).size).toBe(50);
    // RFC 9562 version 4 layout: version nibble 4, variant bits 10xx.
    for (const i of items) expect(i.clientId).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    const retried = queueReducer(fail(items, items[0].id, true), { type: 'retryNow' })[0];
    expect(tagFields(retried).clientId).toBe(items[0].clientId);
    expect(UploadMetaSchema.parse(tagFields(retried)).clientId).toBe(items[0].clientId);
  });

  it('sends one job’s shots one after another in the order taken, other jobs side by side, never over the limit', () => {
    const other = [newItem(8, file('o1.jpg'), { ...tags }), newItem(9, file('o2.jpg'), { ...tags })];
    let items = queueReducer([], { type: 'add', items: [...make(3), ...other] });
    expect(nextToStart(items, 2).map((i) => i.id)).toEqual([items[0].id, other[0].id]);
    items = queueReducer(items, { type: 'started', id: items[0].id });
    expect(nextToStart(items, 2).map((i) => i.id)).toEqual([other[0].id]);
    // An earlier shot waiting for its retry holds the later ones of its job; a refused or paused one does not.
    items = fail(items, items[0].id, true);
    expect(nextToStart(items, 3).map((i) => i.id)).toEqual([other[0].id, other[1].id]);
    items = queueReducer(items, { type: 'failed', id: items[0].id, message: 'Not a photo', retryable: false, now: 0 });
    expect(items[0].status).toBe('failed');
    items = queueReducer(items, { type: 'pause', id: items[1].id });
    expect(nextToStart(items, 1).map((i) => i.id)).toEqual([items[2].id]);
  });

  it('keeps a shot that could not reach the server at all waiting, however long the outage, with capped backoff', () => {
    let items = make(1);
    const id = items[0].id;
    for (let n = 1; n <= 20; n++) {
      items = queueReducer(queueReducer(items, { type: 'started', id }), {
        type: 'failed',
        id,
        message: 'No connection',
        retryable: true,
        now: 0,
        offline: true,
      });
      expect(items[0]).toMatchObject({ status: 'waiting_retry', errorCode: 'OFFLINE', retryAt: backoffMs(Math.min(n, MAX_AUTO_ATTEMPTS)) });
      items = queueReducer(items, { type: 'retryDue', now: 60_000 });
    }
  });

  it('holds a shot that is still being kept on the phone, and the later ones of its job, until it is saved', () => {
    let items = queueReducer([], { type: 'add', items: make(2).map((i) => ({ ...i, status: 'saving' as const })) });
    expect(nextToStart(items, 2)).toEqual([]);
    items = queueReducer(items, { type: 'saved', id: items[1].id });
    expect(nextToStart(items, 2)).toEqual([]);
    items = queueReducer(items, { type: 'saved', id: items[0].id });
    expect(nextToStart(items, 2).map((i) => i.id)).toEqual([items[0].id]);
  });

  it('keeps a shot the server could not store for lack of disk space queued, however often, and never marks it failed', () => {
    let items = make(1);
    const id = items[0].id;
    const message = 'The server’s disk is full … tell the shop manager';
    for (let n = 0; n < MAX_AUTO_ATTEMPTS + 3; n++) {
      items = queueReducer(queueReducer(items, { type: 'started', id }), { type: 'failed', id, message, retryable: true, now: 1000, code: 'STORAGE_FULL' });
      expect(items[0]).toMatchObject({ status: 'waiting_retry', errorCode: 'STORAGE_FULL', error: message, retryAt: 61_000 });
      items = queueReducer(items, { type: 'retryDue', now: 61_000 });
      expect(items[0].status).toBe('queued');
    }
  });

  it('backs off 1 s, 2 s, 4 s … up to 30 s', () => {
    expect([1, 2, 3, 4, 5, 6, 9].map(backoffMs)).toEqual([1000, 2000, 4000, 8000, 16000, 30000, 30000]);
  });

  it('retries a dropped connection on its own, after the backoff', () => {
    let items = make(1);
    const id = items[0].id;
    items = fail(queueReducer(items, { type: 'started', id }), id, true, 5000);
    expect(items[0]).toMatchObject({ status: 'waiting_retry', attempts: 1, retryAt: 6000, error: 'No connection' });
    expect(nextRetryAt(items)).toBe(6000);
    expect(queueReducer(items, { type: 'retryDue', now: 5999 })[0].status).toBe('waiting_retry');
    expect(queueReducer(items, { type: 'retryDue', now: 6000 })[0].status).toBe('queued');
  });

  it('stops retrying on its own after the last automatic attempt, and a manual retry starts afresh', () => {
    let items = make(1);
    const id = items[0].id;
    for (let n = 0; n < MAX_AUTO_ATTEMPTS; n++)
      items = queueReducer(fail(queueReducer(items, { type: 'started', id }), id, true), { type: 'retryDue', now: Infinity });
    expect(items[0]).toMatchObject({ status: 'failed', attempts: MAX_AUTO_ATTEMPTS });
    items = queueReducer(items, { type: 'retryNow', id });
    expect(items[0]).toMatchObject({ status: 'queued', attempts: 0 });
  });

  it('does not retry what the server refused, and keeps its message', () => {
    let items = make(1);
    items = queueReducer(items, { type: 'failed', id: items[0].id, message: 'That kind of file is not accepted.', retryable: false, now: 0 });
    expect(items[0]).toMatchObject({ status: 'failed', error: 'That kind of file is not accepted.', retryAt: null });
  });

  it('never sends a refused shot again by itself (online event, next sign-in); its own Retry does; a signed-out refusal goes again', () => {
    let items = make(3);
    const [refused, expired, waiting] = items.map((i) => i.id);
    items = queueReducer(items, { type: 'failed', id: refused, message: 'This job is closed.', retryable: false, now: 0, code: 'JOB_CLOSED' });
    items = queueReducer(items, { type: 'failed', id: expired, message: 'Please sign in.', retryable: false, now: 0, code: 'SESSION_EXPIRED' });
    items = fail(items, waiting, true);
    items = queueReducer(items, { type: 'retryNow' });
    expect(items.map((i) => [i.status, i.error])).toEqual([
      ['failed', 'This job is closed.'],
      ['queued', 'Please sign in.'],
      ['queued', 'No connection'],
    ]);
    items = queueReducer(items, { type: 'retryNow', id: refused });
    expect(items[0].status).toBe('queued');
  });

  it('keeps a paused shot paused when its aborted request reports back', () => {
    let items = make(1);
    const id = items[0].id;
    items = queueReducer(queueReducer(items, { type: 'started', id }), { type: 'pause', id });
    expect(fail(items, id, true)[0].status).toBe('paused');
    expect(queueReducer(items, { type: 'resume', id })[0].status).toBe('queued');
  });

  it('tags in bulk and flags stored shots whose tags changed for a re-tag', () => {
    let items = make(3);
    const [a, b] = items;
    items = queueReducer(items, { type: 'stored', id: a.id, assetId: 11, tags: a.tags });
    items = queueReducer(items, { type: 'tag', ids: [a.id, b.id], patch: { phase: 'after' } });
    expect(items.map((i) => i.tags.phase)).toEqual(['after', 'after', 'before']);
    expect(items.map(needsRetag)).toEqual([true, false, false]);
    items = queueReducer(items, { type: 'tagsSaved', id: a.id, tags: items[0].tags });
    expect(needsRetag(items[0])).toBe(false);
  });

  it('never drops a shot that is being sent', () => {
    let items = make(1);
    items = queueReducer(items, { type: 'started', id: items[0].id });
    expect(queueReducer(items, { type: 'remove', id: items[0].id })).toHaveLength(1);
  });

  it('sends videos and large files over the resumable protocol, photos as a form', () => {
    expect(transportFor(file('a.jpg'))).toBe('form');
    expect(transportFor(file('a.mp4', 'video/mp4'))).toBe('tus');
    expect(transportFor(file('big.jpg', 'image/jpeg', 17 * 1024 * 1024))).toBe('tus');
  });
});
