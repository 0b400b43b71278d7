import { invitationMail, passwordResetMail, signupConfirmMail } from './account';
import { estimateDecisionMail } from './estimate-decision';
import { esc, SECRET_REMOVED, type ShopBrand, withoutSecrets } from './layout';
import { paymentReceiptMail } from './payment-receipt';
import { reportReadyMail } from './report-ready';

const shop = (brandPrimary: string): ShopBrand => ({
  name: 'Spoke & "Sons"',
  brandPrimary,
  email: 'desk@shop.example.test',
  phone: '+44 1632 960000',
  address: '1 Canal Row',
});
const base = {
  ownerName: 'Ada',
  jobNumber: 'J-2026-0042',
  dated: '5 Dec 2026',
  bikeLabel: 'Quillon Stratus',
  version: 1,
  attached: true,
  sizeBytes: 200_000,
  budgetBytes: 8 * 1024 * 1024,
  stage: { kind: 'finished' } as const,
  link: null,
  linkUntil: null,
};

describe('mail templates', () => {
  it('escapes the shop name and picks the header text colour by WCAG contrast (white on dark teal, black on pale yellow)', () => {
    const dark = reportReadyMail({ ...base, shop: shop('#1F5F5B') });
    expect(dark.html).toContain('Spoke &amp; &quot;Sons&quot;');
    expect(dark.html).toContain('background-color:#1F5F5B;color:#FFFFFF');
    const pale = reportReadyMail({ ...base, shop: shop('#F7E27A') });
    expect(pale.html).toContain('background-color:#F7E27A;color:#000000');
  });

  it('ends the plain text with the usual "-- " signature line and the shop contact, one per line', () => {
    const mail = reportReadyMail({ ...base, shop: shop('#1F5F5B') });
    expect(mail.text.endsWith('\n\n-- \nSpoke & "Sons"\n1 Canal Row\n+44 1632 960000\ndesk@shop.example.test\n')).toBe(true);
  });

  it('is dated as the shop writes dates, beside the job number, in both bodies', () => {
    // The day comes in written by domain formatDate (tested against CLDR there); here: it is shown as given.
    const mail = reportReadyMail({ ...base, shop: shop('#1F5F5B'), dated: 'Dec 5, 2026' });
    expect(mail.text).toContain('Job J-2026-0042 · Dec 5, 2026');
    expect(mail.html).toContain('Job J-2026-0042 · Dec 5, 2026');
  });

  it('says a re-issued report replaces the earlier one, in both bodies', () => {
    const mail = reportReadyMail({ ...base, shop: shop('#1F5F5B'), version: 2 });
    expect(mail.text).toContain('version 2 of the report');
    expect(mail.html).toContain('version 2 of the report');
  });

  it('over the budget without an owner page, tells the owner to ask for a copy and shows no link', () => {
    const mail = reportReadyMail({ ...base, shop: shop('#1F5F5B'), attached: false, sizeBytes: 12 * 1024 * 1024, link: null });
    expect(mail.text).toContain('The report is 12.0 MB, larger than the 8.0 MB we attach');
    expect(mail.text).toContain('Ask us and we will hand you a copy.');
    expect(mail.html).not.toContain('href=');
  });

  it('puts the owner link on the estimate e-mail and refuses anything but http(s)', () => {
    const mail = estimateDecisionMail({
      shop: shop('#1F5F5B'),
      ownerName: 'Ada',
      jobNumber: 'J-1',
      bikeLabel: 'Stratus',
      link: 'https://bench.example.test/o/k3y',
    });
    expect(mail.text).toContain('Your estimate: https://bench.example.test/o/k3y');
    expect(mail.html).toContain('href="https://bench.example.test/o/k3y"');
    expect(() =>
      estimateDecisionMail({ shop: shop('#1F5F5B'), ownerName: 'Ada', jobNumber: 'J-1', bikeLabel: 'Stratus', link: 'javascript:alert(1)' }),
    ).toThrow(/http/);
  });

  it('takes a secret out of both bodies, also where HTML escaping changed its spelling, and leaves the rest of the wording', () => {
    const link = 'https://bench.example.test/o/k3y?a=1&b=2';
    const mail = estimateDecisionMail({ shop: shop('#1F5F5B'), ownerName: 'Ada', jobNumber: 'J-1', bikeLabel: 'Stratus', link });
    expect(mail.html).toContain('k3y?a=1&amp;b=2');
    const text = withoutSecrets(mail.text, [link]);
    const html = withoutSecrets(mail.html, [link]);
    expect(text).toContain(`Your estimate: ${SECRET_REMOVED}`);
    expect(html).toContain(`href="${SECRET_REMOVED}"`);
    expect(`${text}${html}`).not.toContain('k3y');
    expect(html).toContain('See the estimate and decide');
    expect(withoutSecrets(mail.text, [])).toBe(mail.text);
  });
});

describe('mail templates: what comes from the records is escaped in every kind', () => {
  const name = `Rosa O'Dell <script>x</script> & "Co"`;
  const escaped = 'Rosa O&#x27;Dell &lt;script&gt;x&lt;/script&gt; &amp; &quot;Co&quot;';
  const brand = shop('#1F5F5B');
  const link = "https://bench.example.test/o/k3y?a=1&b='2'";
  const kinds = {
    report: reportReadyMail({ ...base, shop: brand, ownerName: name, link, linkUntil: '12 Dec 2026' }),
    estimate: estimateDecisionMail({ shop: brand, ownerName: name, jobNumber: 'J-1', bikeLabel: 'Stratus', link }),
    receipt: paymentReceiptMail({
      ...{ shop: { ...brand, taxNumber: 'GB 123', currency: 'GBP' }, ownerName: name, jobNumber: 'J-1', bikeLabel: 'Stratus' },
      ...{ netMinor: 3000, taxMinor: 600, grossMinor: 3600, payments: [{ label: 'Cash', amountMinor: 3600 }], paidOn: '5 Dec 2026' },
    }),
    invitation: invitationMail({ shop: brand, name, roleLabel: 'Mechanic', inviterName: 'Ada', link, expiresOn: '12 Dec 2026' }),
    reset: passwordResetMail({ shop: brand, name, link, minutes: 30, byManager: null }),
    signup: signupConfirmMail({ shop: brand, name, link, hours: 24 }),
  };

  it.each(Object.entries(kinds))('%s: the name is escaped in the HTML, as typed in the text part', (_kind, mail) => {
    expect(mail.html).toContain(escaped);
    expect(mail.html).not.toContain('<script>');
    expect(mail.text).toContain(name);
  });

  it.each(Object.entries(kinds).filter(([k]) => k !== 'receipt'))('%s: a link with & and an apostrophe leaves no trace once taken out', (_kind, mail) => {
    expect(mail.html).toContain(`href="${esc(link)}"`);
    expect(`${withoutSecrets(mail.text, [link])}${withoutSecrets(mail.html, [link])}`).not.toContain('k3y');
  });

  it('the receipt shows each amount in the shop currency, the total bold, and the tax number', () => {
    const { html, text } = kinds.receipt;
    expect(html).toMatch(/font-weight:bold[^>]*>.*Total.*£36\.00/);
    expect(text).toContain('Total: £36.00');
    expect(html).toContain('Tax number: GB 123');
  });
});
