/** What each kind of background work is, in the words a manager uses (task kinds: api infra/tasks/task-kinds.ts). */
const WHAT: Record<string, string> = {
  'media.derivatives': 'Photo previews (the small and screen-size copies of a photo)',
  'media.phash': 'Photo matching for before and after pairs',
  'annotation.render': 'A marked-up photo (arrows, labels, blur)',
  'report.render': 'A bench report PDF',
  'mail.send': 'An e-mail to a customer',
  'showcase.export': 'A showcase download',
  'backup.run': 'The scheduled backup',
};

export const workWhat = (kind: string): string => WHAT[kind] ?? `Background work (${kind})`;

/** Why it failed, in plain words first; the server's own message stays available underneath. */
export function workWhy(lastError: string | null): string {
  const e = lastError ?? '';
  if (/ENOSPC|SQLITE_FULL|STORAGE_FULL|no space/i.test(e)) return 'The server’s disk was full.';
  if (/ECONNREFUSED|ECONNRESET|EHOSTUNREACH|ENOTFOUND|ETIMEDOUT|timed? ?out|socket/i.test(e))
    return 'Another server (such as the mail server) could not be reached.';
  if (/CONSENT_REVOKED|NO_CONSENT/.test(e)) return 'The customer’s consent no longer covers this.';
  if (e === '') return 'No reason was recorded.';
  return 'It stopped with an error.';
}
