import type * as tus from 'tus-js-client';
import { newItem, queueReducer } from './queue';
import { tusFailure } from './transports';

const tags = { phase: 'before', area: 'brakes', caption: '' } as const;
const video = () => newItem(7, new File([new Uint8Array(10)], 'ride.mp4', { type: 'video/mp4' }), { ...tags });

/** A tus failure as tus-js-client reports it once its own retryDelays are spent. */
const tusError = (status: number | null): Error =>
  Object.assign(new Error('tus: failed to upload chunk'), {
    originalResponse: status === null ? null : ({ getStatus: () => status, getBody: () => '' } as unknown as tus.HttpResponse),
  });

describe('tus uploads are retried by tus-js-client alone', () => {
  it.each([null, 503, 500])('a tus failure (status %s) waits for a person, not for a second automatic retry', (status) => {
    const outcome = tusFailure(tusError(status));
    expect(outcome).toMatchObject({ ok: false, retryable: false });
    const [item] = queueReducer([], { type: 'add', items: [video()] });
    const [after] = queueReducer([item], { type: 'failed', id: item.id, message: 'x', retryable: outcome.ok ? false : outcome.retryable, now: 0 });
    expect(after).toMatchObject({ status: 'failed', retryAt: null, attempts: 1 });
  });
});
