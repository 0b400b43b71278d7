import { textBody } from './text-bodies';

const LINK = 'http://localhost:3000/o/abc.def';

describe('text bodies: the shop name, one sentence and the link, nothing else', () => {
  it.each([
    ['owner_link', 'Spoke & Chain', LINK, `Spoke & Chain: your bike's service page: ${LINK}`],
    ['estimate_decision', 'Spoke & Chain', LINK, `Spoke & Chain: your estimate needs a decision: ${LINK}`],
    ['ready_to_collect', 'Spoke & Chain', null, 'Spoke & Chain: your bike is ready to collect.'],
    ['ready_to_collect', 'Spoke & Chain', LINK, `Spoke & Chain: your bike is ready to collect: ${LINK}`],
    ['ready_to_collect', ' Two\nLines  Cycles ', null, 'Two Lines Cycles: your bike is ready to collect.'],
  ] as const)('%s from %j', (kind, shop, link, expected) => {
    expect(textBody(kind, shop, link)).toBe(expected);
  });

  it('uses GSM-7 characters only, so a text is not sent as UCS-2 (70 characters a part instead of 160; 3GPP TS 23.038 basic set)', () => {
    // The basic character set, from memory (3GPP TS 23.038 table 6.2.1).
    const gsm7 = /^[A-Za-z0-9 @£$¥èéùìòÇ\nØø\rÅåΔ_ΦΓΛΩΠΨΣΘΞÆæßÉ!"#¤%&'()*+,\-./:;<=>?¡ÄÖÑÜ§¿äöñüà]*$/;
    for (const kind of ['owner_link', 'estimate_decision', 'ready_to_collect'] as const) expect(textBody(kind, 'Shop', LINK)).toMatch(gsm7);
  });
});
