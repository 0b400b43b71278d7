import { DomainInputError } from './errors';
import { isTyreSize, parseTyreSize } from './tyre-size';

describe('ISO 5775-1 tyre designation width-BSD (from memory; CHECKS.md B.10)', () => {
  it.each([
    { text: '28-622', width: 28, bsd: 622, label: '28-622 (700C / 29″)' },
    { text: '57-584', width: 57, bsd: 584, label: '57-584 (650B / 27.5″)' },
    { text: '54-559', width: 54, bsd: 559, label: '54-559 (26″ MTB)' },
    { text: '23-571', width: 23, bsd: 571, label: '23-571 (650C)' },
    { text: '47-406', width: 47, bsd: 406, label: '47-406 (20″)' },
    { text: '47-305', width: 47, bsd: 305, label: '47-305 (16″)' },
    { text: ' 37-590 ', width: 37, bsd: 590, label: '37-590' },
    { text: '120-559', width: 120, bsd: 559, label: '120-559 (26″ MTB)' },
  ])('$text', ({ text, width, bsd, label }) => {
    expect(parseTyreSize(text)).toEqual({ widthMm: width, bsdMm: bsd, label });
  });

  it.each(['abc', '700x28c', '28-62', '622-28', '8-622', '28-990', '28 622', ''])('rejects %j', (text) => {
    expect(() => parseTyreSize(text)).toThrow(DomainInputError);
    expect(isTyreSize(text)).toBe(false);
  });
});
