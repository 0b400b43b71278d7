import { readableTextOn } from '@benchproof/domain';

/** What every message is branded with: the shop's own name, colours and contact lines. */
export interface ShopBrand {
  name: string;
  brandPrimary: string;
  email: string;
  phone: string;
  address: string;
}

/** A rendered message: subject, plain text and HTML of the same wording. */
export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Everything from the records (names, bike, shop) passes through here before it meets HTML. */
export const esc = (value: string | number): string => String(value).replace(/[&<>"']/g, (c) => ENTITIES[c] ?? c);

/** What a sent message shows where a secret stood. */
export const SECRET_REMOVED = '[link removed after sending]';

/** The body with every secret replaced, as written in plain text and as escaped into HTML. */
export const withoutSecrets = (body: string, secrets: readonly string[]): string =>
  secrets.filter(Boolean).reduce((b, s) => b.split(s).join(SECRET_REMOVED).split(esc(s)).join(esc(SECRET_REMOVED)), body);

/** Only http(s) links become buttons; anything else would be an injection path. */
export const safeLink = (url: string | null | undefined): string | null => (url && /^https?:\/\//i.test(url) ? url : null);

export const contactLines = (shop: ShopBrand): string[] => [shop.address, shop.phone, shop.email].map((s) => s.trim()).filter(Boolean);

/**
 * The HTML frame: a header bar in the shop's primary colour whose text colour comes from the
 * WCAG contrast rule in libs/domain, then the paragraphs, then the shop's contact lines.
 * Inline styles only: many mail clients drop <style> blocks.
 */
export function htmlFrame(shop: ShopBrand, title: string, bodyHtml: string): string {
  const bar = shop.brandPrimary;
  const ink = readableTextOn(bar);
  const contact = contactLines(shop).map(esc).join('<br>');
  return (
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(title)}</title></head>` +
    `<body style="margin:0;padding:0;background:#f3f4f3;font-family:Arial,Helvetica,sans-serif;color:#1b1f23">` +
    `<table role="presentation" width="100%" cellspacing="0" cellpadding="0" style="max-width:600px;margin:0 auto;background:#ffffff">` +
    `<tr><td style="background:${esc(bar)};color:${ink};padding:16px 20px;font-size:20px;font-weight:bold">${esc(shop.name)}</td></tr>` +
    `<tr><td style="padding:20px;font-size:16px;line-height:1.5">${bodyHtml}</td></tr>` +
    `<tr><td style="padding:16px 20px;border-top:1px solid #dddddd;font-size:13px;color:#4a4f55">${contact}</td></tr>` +
    `</table></body></html>`
  );
}

/** A big, easy-to-tap link button in the shop colour (44 px tall at least). */
export function htmlButton(shop: ShopBrand, href: string, label: string): string {
  const ink = readableTextOn(shop.brandPrimary);
  return `<p><a href="${esc(href)}" style="display:inline-block;background:${esc(shop.brandPrimary)};color:${ink};padding:14px 22px;border-radius:6px;text-decoration:none;font-weight:bold;min-height:16px">${esc(label)}</a></p>`;
}

export const paragraphs = (lines: string[]): string => lines.map((l) => `<p style="margin:0 0 14px">${esc(l)}</p>`).join('');

/** Plain text of the same message: paragraphs, then the shop's name and contact lines. */
export const textFrame = (shop: ShopBrand, lines: string[]): string => `${lines.join('\n\n')}\n\n-- \n${[shop.name, ...contactLines(shop)].join('\n')}\n`;
