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

/** React's own escaping of text and attribute values (react-dom escapeTextForBrowser), so a secret is found in the HTML as React wrote it. */
const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#x27;' };

/** A value as it appears in the rendered HTML. */
export const esc = (value: string | number): string => String(value).replace(/[&<>"']/g, (c) => ENTITIES[c] ?? c);

/** What a sent message shows where a secret stood. */
export const SECRET_REMOVED = '[link removed after sending]';

/** The body with every secret replaced, as written in plain text and as escaped into HTML. */
export const withoutSecrets = (body: string, secrets: readonly string[]): string =>
  secrets.filter(Boolean).reduce((b, s) => b.split(s).join(SECRET_REMOVED).split(esc(s)).join(esc(SECRET_REMOVED)), body);

/** Only http(s) links become buttons; anything else would be an injection path. */
export const safeLink = (url: string | null | undefined): string | null => (url && /^https?:\/\//i.test(url) ? url : null);

export const contactLines = (shop: ShopBrand): string[] => [shop.address, shop.phone, shop.email].map((s) => s.trim()).filter(Boolean);

/** Plain text of the same message: paragraphs, then the usual "-- " signature line, the shop's name and contact lines. */
export const textFrame = (shop: ShopBrand, lines: string[]): string => `${lines.join('\n\n')}\n\n-- \n${[shop.name, ...contactLines(shop)].join('\n')}\n`;
