import PgBoss from 'pg-boss';
import nodemailer, { type Transporter } from 'nodemailer';
import type { AppConfig } from '../config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

const QUEUE = 'mail-send';

/**
 * E-mail goes through a PostgreSQL-backed job queue (pg-boss): a request only enqueues, a worker
 * delivers over SMTP with retries, so a mail server that is down fails no request and loses no message.
 */
export class MailQueue {
  private readonly boss: PgBoss;
  private readonly transport: Transporter;
  private started: Promise<void> | undefined;

  constructor(private readonly config: AppConfig) {
    this.boss = new PgBoss({ connectionString: config.databaseUrl, schema: 'pgboss', max: 4 });
    this.boss.on('error', (error: Error) => console.error(`mail queue: ${error.message}`));
    this.transport = nodemailer.createTransport({
      host: config.smtp.host,
      port: config.smtp.port,
      secure: false,
      ignoreTLS: true,
      connectionTimeout: 5000,
    });
  }

  /** Starts the queue and its worker; safe to call more than once. */
  start(): Promise<void> {
    this.started ??= (async () => {
      await this.boss.start();
      await this.boss.createQueue(QUEUE);
      await this.boss.work<OutgoingMail>(QUEUE, { pollingIntervalSeconds: 0.5, batchSize: 5 }, async (jobs) => {
        for (const job of jobs) await this.deliver(job.data);
      });
    })();
    return this.started;
  }

  async enqueue(mail: OutgoingMail): Promise<void> {
    await this.start();
    await this.boss.send(QUEUE, mail, { retryLimit: 8, retryDelay: 2, retryBackoff: true });
  }

  async stop(): Promise<void> {
    if (!this.started) return;
    await this.started.catch(() => undefined);
    await this.boss.stop({ graceful: true, wait: true, timeout: 5000 });
    this.transport.close();
  }

  private async deliver(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.smtp.from, to: mail.to, subject: mail.subject, text: mail.text });
  }
}
