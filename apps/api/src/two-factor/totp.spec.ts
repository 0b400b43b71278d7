import { generateSync } from 'otplib';
import { newRecoveryCodes, openSecret, sealSecret, totpAt, totpStep, hashRecoveryCode } from './totp';

/**
 * RFC 6238 Appendix B test vectors (https://www.rfc-editor.org/rfc/rfc6238#appendix-B): the ASCII
 * seeds "12345678901234567890" (SHA-1, 20 bytes), the same repeated to 32 bytes (SHA-256) and to 64
 * bytes (SHA-512), 8 digits, T0 = 0, X = 30 s. Checked against otplib, which the product uses.
 */
const SEEDS = {
  sha1: '12345678901234567890',
  sha256: '12345678901234567890123456789012',
  sha512: '1234567890123456789012345678901234567890123456789012345678901234',
} as const;

const APPENDIX_B: Array<[number, string, keyof typeof SEEDS]> = [
  [59, '94287082', 'sha1'],
  [59, '46119246', 'sha256'],
  [59, '90693936', 'sha512'],
  [1111111109, '07081804', 'sha1'],
  [1111111109, '68084774', 'sha256'],
  [1111111109, '25091201', 'sha512'],
  [1111111111, '14050471', 'sha1'],
  [1111111111, '67062674', 'sha256'],
  [1111111111, '99943326', 'sha512'],
  [1234567890, '89005924', 'sha1'],
  [1234567890, '91819424', 'sha256'],
  [1234567890, '93441116', 'sha512'],
  [2000000000, '69279037', 'sha1'],
  [2000000000, '90698825', 'sha256'],
  [2000000000, '38618901', 'sha512'],
  [20000000000, '65353130', 'sha1'],
  [20000000000, '77737706', 'sha256'],
  [20000000000, '47863826', 'sha512'],
];

describe('TOTP (RFC 6238 Appendix B)', () => {
  it.each(APPENDIX_B)('T=%i gives %s with %s', (time, expected, algorithm) => {
    const secret = new TextEncoder().encode(SEEDS[algorithm]);
    expect(generateSync({ secret, epoch: time, digits: 8, algorithm, period: 30 })).toBe(expected);
  });

  it('accepts the current code and one step either side, and nothing older', () => {
    const secret = 'GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ'; // base32 of "12345678901234567890"
    const now = 1111111111;
    // RFC 6238 Appendix B, SHA-1 at T=1111111111 is 14050471; the 6-digit code is its last six digits (RFC 4226 §5.3).
    expect(totpAt(secret, now)).toBe('050471');
    expect(totpStep(secret, '050471', now)).toBe(Math.floor(now / 30));
    expect(totpStep(secret, totpAt(secret, now - 30), now)).toBe(Math.floor(now / 30) - 1);
    expect(totpStep(secret, totpAt(secret, now + 30), now)).toBe(Math.floor(now / 30) + 1);
    expect(totpStep(secret, totpAt(secret, now - 90), now)).toBeNull();
    expect(totpStep(secret, 'abcdef', now)).toBeNull();
  });

  it('seals secrets so only the same server secret opens them', () => {
    const sealed = sealSecret('x'.repeat(32), 'JBSWY3DPEHPK3PXP');
    expect(sealed).not.toContain('JBSWY3DPEHPK3PXP');
    expect(openSecret('x'.repeat(32), sealed)).toBe('JBSWY3DPEHPK3PXP');
    expect(() => openSecret('y'.repeat(32), sealed)).toThrow();
  });

  it('makes ten distinct recovery codes whose hash ignores the dash and case', () => {
    const codes = newRecoveryCodes();
    expect(new Set(codes).size).toBe(10);
    for (const c of codes) expect(c).toMatch(/^[a-z2-9]{5}-[a-z2-9]{5}$/);
    expect(hashRecoveryCode(codes[0])).toBe(hashRecoveryCode(codes[0].replace('-', '').toUpperCase()));
  });
});
