import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';

export interface CapturedMailFile {
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

/** Waits until the local SMTP catcher has kept a message for `to` matching `subject`. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 15_000): Promise<CapturedMailFile> {
  const dir = path.resolve(process.env.MAIL_OUTBOX_DIR ?? '.data/outbox');
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith('.json')).sort().reverse();
    for (const name of names) {
      const mail = JSON.parse(await readFile(path.join(dir, name), 'utf8')) as CapturedMailFile;
      if (mail.to.includes(to) && subject.test(mail.subject)) return mail;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no e-mail to ${to} matching ${subject} within ${timeoutMs / 1000} s`);
}

/** The single-use token in the first link of a captured e-mail. */
export function tokenFromMail(mail: CapturedMailFile): string {
  const match = /[?&]token=([^\s&]+)/.exec(mail.text);
  if (!match) throw new Error(`no link with a token in: ${mail.text}`);
  return decodeURIComponent(match[1]);
}
