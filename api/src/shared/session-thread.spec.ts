import path from 'node:path';
import { CSV_ENCODER_ROLE, type CopyLines, type FromEncoder } from '../exports/csv-encode-thread';
import { SessionThread } from './session-thread';

/** Session threads, with the CSV encoder as the thread's module: kept while in use, ended when idle, replaced after. */
describe('session threads', () => {
  const file = path.join(__dirname, '../exports/csv-encode-thread.js');
  const instance = 99;
  const idleBefore = SessionThread.idleMs;
  const TEXT = 25;

  beforeAll(() => {
    SessionThread.idleMs = 150;
  });

  afterAll(() => {
    SessionThread.idleMs = idleBefore;
  });

  /** One piece of two text columns through a session of its own, closed again. */
  function encode(thread: SessionThread<CopyLines, FromEncoder>, session: string, text: string): Promise<string> {
    return new Promise((resolve, reject) => {
      thread.open(session, (answer) => {
        thread.close(session);
        if ('error' in answer) reject(new Error(answer.error));
        else resolve(answer.csv);
      }, reject);
      thread.send(session, { seq: 0, text, types: [TEXT, TEXT] });
    });
  }

  const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

  it('keeps one thread for sessions one after another, ends it when idle, and starts another for the next session', async () => {
    const first = SessionThread.of<CopyLines, FromEncoder>(file, CSV_ENCODER_ROLE, instance);
    expect(await encode(first, 'a', 'x\ty\n')).toBe('x,y\n');
    expect(SessionThread.of<CopyLines, FromEncoder>(file, CSV_ENCODER_ROLE, instance)).toBe(first);
    expect(await encode(first, 'b', 'a,b\tc\n')).toBe('"a,b",c\n');

    await sleep(SessionThread.idleMs * 3);
    const second = SessionThread.of<CopyLines, FromEncoder>(file, CSV_ENCODER_ROLE, instance);
    expect(second).not.toBe(first);
    expect(second.threadId).not.toBe(first.threadId);
    expect(await encode(second, 'c', 'p\tq\n')).toBe('p,q\n');
  });

  it('does not end a thread while a session is open', async () => {
    const thread = SessionThread.of<CopyLines, FromEncoder>(file, CSV_ENCODER_ROLE, instance);
    thread.open('long', () => undefined, () => undefined);
    await sleep(SessionThread.idleMs * 3);
    expect(SessionThread.of<CopyLines, FromEncoder>(file, CSV_ENCODER_ROLE, instance)).toBe(thread);
    expect(await encode(thread, 'during', 'r\ts\n')).toBe('r,s\n');
    thread.close('long');
  });
});
