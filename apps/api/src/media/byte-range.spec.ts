import { parseRange } from './byte-range';

// Examples from RFC 9110 §14.1.2 (Byte Ranges) for a 10000-byte representation.
describe('parseRange (RFC 9110 §14)', () => {
  it.each([
    ['bytes=0-499', { kind: 'partial', start: 0, end: 499 }],
    ['bytes=500-999', { kind: 'partial', start: 500, end: 999 }],
    ['bytes=-500', { kind: 'partial', start: 9500, end: 9999 }],
    ['bytes=9500-', { kind: 'partial', start: 9500, end: 9999 }],
    ['bytes=9500-20000', { kind: 'partial', start: 9500, end: 9999 }],
    ['bytes=-20000', { kind: 'partial', start: 0, end: 9999 }],
    ['bytes=10000-', { kind: 'unsatisfiable' }],
    ['bytes=-0', { kind: 'unsatisfiable' }],
    ['bytes=0-0,-1', { kind: 'full' }],
    ['bytes=500-400', { kind: 'full' }],
    ['items=0-5', { kind: 'full' }],
    [undefined, { kind: 'full' }],
  ])('%s', (header, expected) => {
    expect(parseRange(header, 10_000)).toEqual(expected);
  });
});
