import { createHash } from 'node:crypto';
import { hashOwnerToken, newOwnerToken, ownerTokenSignatureOk } from './owner-token';

const KEY = 'k'.repeat(40);

describe('owner-link tokens', () => {
  it('carry 256 random bits and a signature that checks', () => {
    const t = newOwnerToken(KEY);
    expect(Buffer.from(t.split('.')[0], 'base64url')).toHaveLength(32);
    expect(ownerTokenSignatureOk(KEY, t)).toBe(true);
    expect(newOwnerToken(KEY)).not.toBe(t);
  });

  it('refuse a changed character, another key, or a wrong shape', () => {
    const t = newOwnerToken(KEY);
    const flipped = (t[0] === 'A' ? 'B' : 'A') + t.slice(1);
    expect(ownerTokenSignatureOk(KEY, flipped)).toBe(false);
    expect(ownerTokenSignatureOk('x'.repeat(40), t)).toBe(false);
    expect(ownerTokenSignatureOk(KEY, `${t}.x`)).toBe(false);
    expect(ownerTokenSignatureOk(KEY, '1')).toBe(false);
  });

  it('hash as hex SHA-256 (node:crypto as the reference)', () => {
    expect(hashOwnerToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'); // FIPS 180-2 example "abc"
    expect(hashOwnerToken('abc')).toBe(createHash('sha256').update('abc').digest('hex'));
  });
});
