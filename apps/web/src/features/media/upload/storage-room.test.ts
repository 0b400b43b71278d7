import { LOW_ROOM_BYTES, megabytes, roomIsLow, roomLeft } from './storage-room';

const MB = 1024 * 1024;

describe('room on the phone for waiting shots (StorageManager.estimate(), WHATWG Storage Standard §4)', () => {
  it.each([
    // [usage, quota, left, low]
    [0, 10_000 * MB, 10_000 * MB, false],
    [9_850 * MB, 10_000 * MB, 150 * MB, true], // under the 200 MB floor
    [9_500 * MB, 10_000 * MB, 500 * MB, true], // over the floor but under a tenth
    [8_500 * MB, 10_000 * MB, 1_500 * MB, false],
    [1_000 * MB, 1_050 * MB, 50 * MB, true],
    [900 * MB, 1_000 * MB, 100 * MB, true], // a tenth of a small quota
    [20_000 * MB, 10_000 * MB, 0, true], // usage over quota (possible while the browser evicts)
  ])('usage %d of quota %d leaves %d bytes, low: %s', (usage, quota, left, low) => {
    expect(roomLeft({ usage, quota })).toBe(left);
    expect(roomIsLow({ usage, quota })).toBe(low);
  });

  it('says nothing when the browser gives no estimate', () => {
    expect(roomLeft(null)).toBeNull();
    expect(roomLeft({ usage: 5 })).toBeNull();
    expect(roomIsLow({})).toBe(false);
  });

  it('writes the room in whole megabytes (binary, as the floor is counted)', () => {
    expect(megabytes(LOW_ROOM_BYTES)).toBe('200 MB');
    expect(megabytes(150 * MB + 999)).toBe('150 MB');
  });
});
