import { isMainThread, Worker, workerData } from 'node:worker_threads';

/**
 * A worker thread that many sessions share (the imports being written, the exports being
 * encoded): started with the first session and kept, because starting a thread and compiling its
 * code again for every request cost more than a tenth of a second. Messages carry the session
 * they belong to. The thread keeps the process alive only while a session is open, and ends
 * after a minute without one, so that its memory goes back. Should it fail, every open session
 * hears why; the next session starts another thread.
 */
export class SessionThread<ToThread extends object, FromThread extends { session: string }> {
  private static readonly running = new Map<string, SessionThread<object, { session: string }>>();
  /** how long a thread without sessions is kept */
  static idleMs = 60_000;
  private readonly worker: Worker;
  private idle: NodeJS.Timeout | null = null;
  private readonly sessions = new Map<string, { hear: (message: FromThread) => void; stop: (error: Error) => void }>();

  /**
   * The thread running `file` (a compiled module that serves when `isSessionThread(role)`),
   * started if it is not running; `instance` tells apart several threads of the same module.
   */
  static of<T extends object, F extends { session: string }>(file: string, role: string, instance = 0): SessionThread<T, F> {
    const key = `${file}#${instance}`;
    let thread = SessionThread.running.get(key);
    if (!thread) {
      thread = new SessionThread(key, file, role);
      SessionThread.running.set(key, thread);
    }
    // Its session is about to open: the idle time starts again.
    if (thread.sessions.size === 0) thread.restartIdleTime();
    return thread as unknown as SessionThread<T, F>;
  }

  private constructor(private readonly key: string, file: string, role: string) {
    this.worker = new Worker(file, { workerData: { kxSessionThread: role } });
    this.worker.unref();
    this.worker.on('message', (message: FromThread) => this.sessions.get(message.session)?.hear(message));
    this.worker.on('error', (error) => this.gone(error));
    this.worker.on('exit', () => this.gone(new Error('the worker thread stopped')));
  }

  /** The worker's thread id (a new thread has a new one). */
  get threadId(): number {
    return this.worker.threadId;
  }

  open(session: string, hear: (message: FromThread) => void, stop: (error: Error) => void): void {
    if (this.idle) clearTimeout(this.idle);
    this.idle = null;
    if (this.sessions.size === 0) this.worker.ref();
    this.sessions.set(session, { hear, stop });
  }

  close(session: string): void {
    if (!this.sessions.delete(session) || this.sessions.size > 0) return;
    this.worker.unref();
    this.restartIdleTime();
  }

  send(session: string, message: ToThread): void {
    this.worker.postMessage({ ...message, session });
  }

  private restartIdleTime(): void {
    if (this.idle) clearTimeout(this.idle);
    this.idle = setTimeout(() => {
      if (this.sessions.size > 0) return;
      // Out of the registry first, so that a session from now on gets a new thread.
      if ((SessionThread.running.get(this.key) as unknown) === this) SessionThread.running.delete(this.key);
      void this.worker.terminate();
    }, SessionThread.idleMs);
    this.idle.unref();
  }

  private gone(error: Error): void {
    if (this.idle) clearTimeout(this.idle);
    if ((SessionThread.running.get(this.key) as unknown) === this) SessionThread.running.delete(this.key);
    const sessions = [...this.sessions.values()];
    this.sessions.clear();
    for (const session of sessions) session.stop(error);
  }
}

/** True in the thread that `SessionThread.of(file, role)` started for `role`: the module is to serve. */
export function isSessionThread(role: string): boolean {
  return !isMainThread && workerData?.kxSessionThread === role;
}
