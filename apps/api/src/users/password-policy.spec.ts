import { DomainError } from '../core/http';
import { assertStrongPassword, personalWords } from './password-policy';

const ctx = { userName: 'Juno Abara', email: 'juno@northgate-cycles.test', shopName: 'Northgate & Mill Cycle Works' };

const refused = (password: string): string | null => {
  try {
    assertStrongPassword(password, ctx);
    return null;
  } catch (e) {
    return e instanceof DomainError ? e.code : 'other';
  }
};

/** Scores from zxcvbn-ts (@zxcvbn-ts/core with the common and English dictionaries), the reference library. */
describe('password guessability', () => {
  it.each([
    ['password1234', 'among the commonest'],
    ['qwertyuiop12', 'a keyboard walk'],
    ['northgate2026', 'the shop name and a year'],
    ['NorthgateMill!', 'two words of the shop name'],
    ['junoabara123', 'the user name'],
    ['CycleWorks99', 'the end of the shop name'],
  ])('refuses %s (%s)', (password) => {
    expect(refused(password)).toBe('WEAK_PASSWORD');
  });

  it.each(['quiet-gravel-otter-52', 'rosehip-spanner-87', 'Tr41l-m1x-Sp0kes!'])('accepts %s', (password) => {
    expect(refused(password)).toBeNull();
  });

  it('takes words, joined names and adjacent pairs from the person and the shop', () => {
    const words = personalWords(ctx);
    expect(words).toEqual(expect.arrayContaining(['juno', 'abara', 'junoabara', 'northgate', 'northgatemill', 'cycleworks', 'northgate-cycles']));
  });
});
