import { renderHtml } from './email-kit';
import { LinkButton, MailFrame, Paragraphs } from './frame';
import { safeLink, type RenderedMail, type ShopBrand, textFrame } from './layout';

/**
 * Where the job stands when the report goes out; it decides what the e-mail may claim.
 * finished: ready or handed over; decision: open items wait for the owner; in_progress: neither;
 * record: a cancelled job (what we found, no claim about the work).
 */
export type ReportMailStage = { kind: 'finished' } | { kind: 'decision'; openItems: number } | { kind: 'in_progress' } | { kind: 'record' };

export interface ReportReadyInput {
  shop: ShopBrand;
  ownerName: string;
  jobNumber: string;
  /** The day of the message, as a letter is dated, already written in the shop's locale (domain formatDate). */
  dated: string;
  bikeLabel: string;
  version: number;
  stage: ReportMailStage;
  /** true: the PDF goes with the message; false: it was over the size budget. */
  attached: boolean;
  sizeBytes: number;
  budgetBytes: number;
  /** The owner's private page (report, photos, decisions), or null when the job has none (cancelled). */
  link: string | null;
  /** The last day the link works, written in the shop's locale. */
  linkUntil: string | null;
}

const mb = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
const items = (n: number) => (n === 1 ? '1 item needs' : `${n} items need`);

/** Subject and opening paragraph, by stage: "finished" is said only of finished work. */
function opening(input: ReportReadyInput): { subject: string; intro: string[]; button: string } {
  const bike = input.bikeLabel;
  const job = `(job ${input.jobNumber})`;
  switch (input.stage.kind) {
    case 'finished':
      return {
        subject: `Your bench report for ${bike} is ready ${job}`,
        intro: [
          `We have finished the work on your ${bike}. The bench report records what we found, what we did and what we recommend next, with photos from the workstand.`,
        ],
        button: 'Open your page',
      };
    case 'decision':
      return {
        subject: `Your decision, please: bench report for ${bike} ${job}`,
        intro: [
          `Here is the bench report for your ${bike}: what we found on the workstand, with photos and prices.`,
          `${items(input.stage.openItems)} your decision before we go on. Please approve or decline each one on your private page; we do not start extra work until you have decided.`,
        ],
        button: 'See the items and decide',
      };
    case 'in_progress':
      return {
        subject: `Bench report for your ${bike} ${job}`,
        intro: [
          `Here is the bench report for your ${bike} so far: what we found and what we have done, with photos from the workstand. We will let you know when it is ready to collect.`,
        ],
        button: 'Open your page',
      };
    case 'record':
      return {
        subject: `Bench report for your ${bike} ${job}`,
        intro: [`Here is the bench report for your ${bike}: what we found on the workstand, with photos.`],
        button: 'Open your page',
      };
  }
}

/** Where the report is: attached, or (over the budget) behind the link, or to be asked for. */
function where(input: ReportReadyInput, link: string | null): string {
  if (input.attached) return 'The report is attached to this e-mail as a PDF.';
  const why = `The report is ${mb(input.sizeBytes)}, larger than the ${mb(input.budgetBytes)} we attach to e-mails (many mail services refuse bigger files), so it is not attached.`;
  return `${why} ${link ? 'Open it and download it from your private page with the link below.' : 'Ask us and we will hand you a copy.'}`;
}

/** The report e-mail: one message with the PDF (within the budget) and the owner's private link. */
export function reportReadyMail(input: ReportReadyInput): RenderedMail {
  const { shop } = input;
  const link = safeLink(input.link);
  const { subject, intro, button } = opening(input);
  const revised = input.version > 1 ? `This is version ${input.version} of the report; it replaces the one we sent before.` : null;
  const privacy = link ? `The link is yours alone: please do not forward it.${input.linkUntil ? ` It works until ${input.linkUntil}.` : ''}` : null;
  const close = 'If anything in it is unclear, reply to this e-mail or call us.';
  const jobLine = `Job ${input.jobNumber} · ${input.dated}`;
  const lines = [`Hello ${input.ownerName},`, ...intro, ...(revised ? [revised] : []), where(input, link)];
  const after = [...(privacy ? [privacy] : []), close];
  const text = textFrame(shop, [...lines, ...(link ? [`Your page: ${link}`] : []), ...after, jobLine]);
  const html = renderHtml(
    <MailFrame shop={shop} title={subject} preview={intro[0]}>
      <Paragraphs lines={lines} />
      {link ? <LinkButton shop={shop} href={link} label={button} /> : null}
      <Paragraphs lines={after} />
      <Paragraphs lines={[jobLine]} small />
    </MailFrame>,
  );
  return { subject, text, html };
}
