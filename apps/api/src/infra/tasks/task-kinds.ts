import type { ShowcaseZipRequest } from '@benchproof/contracts';

/**
 * Every background task kind of the server and its payload: the one list to read. Payloads
 * carry ids and requests, never actors or e-mail addresses (a handler looks up what it needs,
 * with today's rights). The task key names the entity; (kind, key) dedupes.
 * Add a kind here, then one `@TaskHandler(kind, …)` method somewhere; start-up fails otherwise.
 */
export type TaskPayloads = {
  /** key = the outbox row's task_key (new for each resend): deliver one outbox message (mail). */
  'mail.send': { messageId: number };
  /** key = text id: send one text message through the provider's SDK (texts). */
  'text.send': { textId: number };
  /** key = asset id: thumb/screen/print JPEGs of a stored photo (media). */
  'media.derivatives': NoPayload;
  /** key = asset id: perceptual hash of a still for pair suggestions (media). */
  'media.phash': NoPayload;
  /** key `slot-<n>`: the scheduled database backup of BACKUP_EVERY_HOURS, then retention (backups). */
  'backup.run': NoPayload;
  /** key `<assetId>:v<version>`: burn an annotation version into its screen and print JPEGs (annotations). */
  'annotation.render': { assetId: number; version: number };
  /** key = report id: lay out the frozen snapshot as a PDF (reports). */
  'report.render': { reportId: number };
  /** key `<userId>-<uuid>`: a showcase zip made in the background for the user who asked (showcase). */
  'showcase.export': { userId: number; req: ShowcaseZipRequest };
};

export type NoPayload = Record<string, never>;
export type TaskKind = keyof TaskPayloads;
/** Any declared kind's payload: what the tasks.payload column holds. */
export type TaskPayload = TaskPayloads[TaskKind];

/** The declared kinds at run time (the compiler keeps this in step with TaskPayloads). */
export const TASK_KINDS = Object.keys({
  'mail.send': 1,
  'text.send': 1,
  'media.derivatives': 1,
  'media.phash': 1,
  'backup.run': 1,
  'annotation.render': 1,
  'report.render': 1,
  'showcase.export': 1,
} satisfies Record<TaskKind, 1>) as TaskKind[];
