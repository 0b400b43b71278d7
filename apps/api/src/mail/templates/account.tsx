import { renderHtml } from './email-kit';
import { LinkButton, MailFrame, Paragraphs } from './frame';
import { safeLink, type RenderedMail, type ShopBrand, textFrame } from './layout';

/** One message with a single button: the link is the only thing the reader needs. */
function linkMail(shop: ShopBrand, subject: string, lines: string[], link: string, button: string, after: string[]): RenderedMail {
  const safe = safeLink(link);
  if (!safe) throw new Error('An account link must be an http(s) address');
  const text = textFrame(shop, [...lines, `${button}: ${safe}`, ...after]);
  const html = renderHtml(
    <MailFrame shop={shop} title={subject} preview={lines[1] ?? subject}>
      <Paragraphs lines={lines} />
      <LinkButton shop={shop} href={safe} label={button} />
      <Paragraphs lines={after} />
    </MailFrame>,
  );
  return { subject, text, html };
}

export interface InvitationMailInput {
  shop: ShopBrand;
  name: string;
  roleLabel: string;
  inviterName: string;
  link: string;
  /** Shown in the shop's locale, e.g. "12 December 2026". */
  expiresOn: string;
}

export const invitationMail = (i: InvitationMailInput): RenderedMail =>
  linkMail(
    i.shop,
    `${i.inviterName} added you to ${i.shop.name} on BenchProof`,
    [
      `Hello ${i.name},`,
      `${i.inviterName} has set up a BenchProof account for you at ${i.shop.name}, as ${i.roleLabel.toLowerCase()}. BenchProof is where the workshop keeps its job cards, photos and bench reports.`,
      'Open the link below and choose your own password to start. Nobody else knows it or can set it for you.',
    ],
    i.link,
    'Choose my password',
    [`The link works once and until ${i.expiresOn}. If you were not expecting this, you can ignore this e-mail.`],
  );

export interface PasswordResetMailInput {
  shop: ShopBrand;
  name: string;
  link: string;
  minutes: number;
  /** True when a manager sent it rather than the person asking for it. */
  byManager: string | null;
}

export const passwordResetMail = (i: PasswordResetMailInput): RenderedMail =>
  linkMail(
    i.shop,
    `Set a new BenchProof password for ${i.shop.name}`,
    [
      `Hello ${i.name},`,
      i.byManager
        ? `${i.byManager} asked for a password link for your ${i.shop.name} account.`
        : `Someone (hopefully you) asked to set a new password for your ${i.shop.name} account.`,
      'Choosing a new password signs you out everywhere else.',
    ],
    i.link,
    'Set a new password',
    [`The link works once, for the next ${i.minutes} minutes. If you did not ask for it, ignore this e-mail: your password stays as it is.`],
  );

export interface SignupMailInput {
  shop: ShopBrand;
  name: string;
  link: string;
  hours: number;
}

export const signupConfirmMail = (i: SignupMailInput): RenderedMail =>
  linkMail(
    i.shop,
    `Confirm your e-mail to open ${i.shop.name} on BenchProof`,
    [`Hello ${i.name},`, `Thanks for signing ${i.shop.name} up. Confirm that this address is yours and your workshop is ready to use.`],
    i.link,
    'Confirm my e-mail',
    [`The link works once, for ${i.hours} hours. If you did not sign up, ignore this e-mail and nothing happens.`],
  );
