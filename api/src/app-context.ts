import type { DataSource } from 'typeorm';
import type { AppConfig } from './config';
import type { ObjectStore } from './storage/object-store';
import type { MailQueue } from './mail/mail-queue';

/** What every feature's routes get handed: settings and the shared connections. */
export interface AppContext {
  config: AppConfig;
  dataSource: DataSource;
  store?: ObjectStore;
  mail?: MailQueue;
}
