/** What a text is about (text_messages.kind). */
export type TextKind = 'owner_link' | 'estimate_decision' | 'ready_to_collect';

/** The shop's name on one line, so a text cannot be made to look like something else. */
const oneLine = (s: string): string => s.replace(/\s+/g, ' ').trim();

/**
 * Every text we send: the shop's name, one short sentence and, where there is one, the link.
 * Nothing else (no owner name, bike or prices): a text can be read on a locked screen. Plain
 * characters only (no curly quote), so the text stays in the GSM-7 alphabet and 160 characters a part.
 * "Ready to collect" carries a fresh owner link when the job had a live one (only a link's hash is stored, so
 * the old one cannot be sent again), else the sentence alone.
 */
export function textBody(kind: TextKind, shopName: string, link: string | null): string {
  const shop = oneLine(shopName);
  if (kind === 'ready_to_collect') return link ? `${shop}: your bike is ready to collect: ${link}` : `${shop}: your bike is ready to collect.`;
  const sentence = kind === 'estimate_decision' ? 'your estimate needs a decision' : "your bike's service page";
  return `${shop}: ${sentence}: ${link ?? ''}`.trim();
}

/** What stays in the stored body once the provider has the text. */
export const LINK_REMOVED = '[link removed after sending]';
