import { renderHtml } from './email-kit';
import { LinkButton, MailFrame, Paragraphs } from './frame';
import { safeLink, type RenderedMail, type ShopBrand, textFrame } from './layout';

export interface EstimateDecisionInput {
  shop: ShopBrand;
  ownerName: string;
  jobNumber: string;
  /** Unused here; part of the context every job e-mail gets. */
  dated?: string;
  bikeLabel: string;
  /** The owner's private page where they approve or decline each item. */
  link: string;
}

/** "Your estimate needs your decision": the owner link, nothing else the owner must type. */
export function estimateDecisionMail(input: EstimateDecisionInput): RenderedMail {
  const { shop } = input;
  const link = safeLink(input.link);
  if (!link) throw new Error('The owner link must be an http(s) address');
  const subject = `Your decision, please: extra work found on ${input.bikeLabel} (job ${input.jobNumber})`;
  const lines = [
    `Hello ${input.ownerName},`,
    `While your ${input.bikeLabel} was on the workstand we found things that need more work than you booked. We have put photos, prices and our advice on one page for you.`,
    'Please approve or decline each item there. We do not start any extra work until you have decided; items that affect safety are marked.',
  ];
  const close = 'Questions? Reply to this e-mail or call us.';
  const text = textFrame(shop, [...lines, `Your estimate: ${link}`, close]);
  const html = renderHtml(
    <MailFrame shop={shop} title={subject} preview={lines[1]}>
      <Paragraphs lines={lines} />
      <LinkButton shop={shop} href={link} label="See the estimate and decide" />
      <Paragraphs lines={[close]} />
    </MailFrame>,
  );
  return { subject, text, html };
}
