import { startMailCatcher, type MailCatcher } from '../../scripts/mail-catcher.mjs';
import { startTestApp, type TestApp } from '../test-app';

/** A test app whose mail goes over real SMTP into a local catcher (both on free ports). */
export async function startAppWithMail(env: Record<string, string> = {}): Promise<{ t: TestApp; catcher: MailCatcher }> {
  const catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
  const t = await startTestApp({ ...env, SMTP_URL: catcher.smtpUrl });
  return { t, catcher };
}

/** Closes the app, then its catcher. */
export async function stopAppWithMail(t: TestApp, catcher: MailCatcher): Promise<void> {
  await t.close();
  await catcher.close();
}
