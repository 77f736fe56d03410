import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import S3rver from 's3rver';
import { requireFreePort } from './free-port';

export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/**
 * A local SMTP server that accepts every message and keeps it as a JSON file in the outbox folder,
 * where the development outbox page and the tests read it.
 */
export async function startMailCatcher(port: number, outboxDir: string): Promise<{ close(): Promise<void> }> {
  await requireFreePort(port, 'local SMTP server', 'SMTP_PORT');
  mkdirSync(outboxDir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: CapturedMail = {
            id: randomUUID(),
            receivedAt: new Date().toISOString(),
            from: addresses(parsed.from).join(', '),
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          };
          const name = `${mail.receivedAt.replace(/[:.]/g, '-')}-${mail.id}.json`;
          // Written aside, then renamed: a reader never sees half a message.
          const partial = path.join(outboxDir, `.${name}.partial`);
          writeFileSync(partial, JSON.stringify(mail, null, 2));
          renameSync(partial, path.join(outboxDir, name));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  return { close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  if (!field) return [];
  const list = Array.isArray(field) ? field : [field];
  return list.flatMap((a) => a.value.map((v) => v.address ?? ''));
}

/** A local S3-compatible object store (s3rver) keeping its objects in a folder. */
export async function startObjectStoreFake(port: number, directory: string, bucket: string): Promise<{ close(): Promise<void> }> {
  await requireFreePort(port, 'local S3-compatible object store', 'S3_PORT');
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({ port, address: '127.0.0.1', directory, silent: true, configureBuckets: [{ name: bucket }] });
  await server.run();
  return { close: () => server.close() };
}
