import { esc, htmlButton, htmlFrame, paragraphs, safeLink, type RenderedMail, type ShopBrand, textFrame } from './layout';

export interface ReportReadyInput {
  shop: ShopBrand;
  ownerName: string;
  jobNumber: string;
  /** The day of the message, as a letter is dated, already written in the shop's locale (domain formatDate). */
  dated: string;
  bikeLabel: string;
  version: number;
  /** true: the PDF goes with the message; false: it was over the size budget. */
  attached: boolean;
  sizeBytes: number;
  budgetBytes: number;
  /** Where the owner can read and download the report (the owner page), if the shop has one. */
  link: string | null;
}

const mb = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/** "Your bench report is ready": the PDF attached, or a link and the reason there is no attachment. */
export function reportReadyMail(input: ReportReadyInput): RenderedMail {
  const { shop } = input;
  const link = safeLink(input.link);
  const subject = `Your bench report for ${input.bikeLabel} is ready (job ${input.jobNumber})`;
  const greeting = `Hello ${input.ownerName},`;
  const intro = `We have finished the work on your ${input.bikeLabel}. The bench report records what we found, what we did and what we recommend next, with photos from the workstand.`;
  const revised = input.version > 1 ? `This is version ${input.version} of the report; it replaces the one we sent before.` : null;
  const where = input.attached
    ? 'The report is attached to this e-mail as a PDF.'
    : `The report is ${mb(input.sizeBytes)}, larger than the ${mb(input.budgetBytes)} we attach to e-mails (many mail services refuse bigger files), so it is not attached. ${link ? 'Open it with the link below.' : 'Ask us and we will hand you a copy.'}`;
  const close = 'If anything in it is unclear, reply to this e-mail or call us.';
  const jobLine = `Job ${input.jobNumber} · ${input.dated}`;
  const lines = [greeting, intro, ...(revised ? [revised] : []), where];
  const text = textFrame(shop, [...lines, ...(link && !input.attached ? [`Your report: ${link}`] : []), close, jobLine]);
  const html = htmlFrame(
    shop,
    subject,
    paragraphs(lines) +
      (link && !input.attached ? htmlButton(shop, link, 'Open your bench report') : '') +
      paragraphs([close]) +
      `<p style="font-size:13px;color:#4a4f55">${esc(jobLine)}</p>`,
  );
  return { subject, text, html };
}
