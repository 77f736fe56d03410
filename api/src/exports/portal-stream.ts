import QueryStream from 'pg-query-stream';

/**
 * The rows of a query as a stream (pg-query-stream), with PostgreSQL running the query as it runs
 * COPY: the portal is executed once for all its rows, which are read as they arrive; while the
 * stream is full the socket is paused, so TCP holds PostgreSQL back and memory stays flat.
 *
 * Read in batches (an Execute with a row limit, pg-query-stream's way), a portal may be suspended,
 * so PostgreSQL runs it without parallel workers: on two cores a full export's first row then came
 * after 10–15 s, when COPY of the same statement was done in 9–11 s; executed once, after 6 s.
 *
 * An Execute cannot be stopped by closing its portal (PostgreSQL reads the Close only once it has
 * sent every row): a stream destroyed while rows are still coming is `abandoned`, and its owner
 * must end the connection rather than reuse it.
 */
export class PortalStream extends QueryStream {
  /** destroyed before PostgreSQL had sent every row: end the connection, do not reuse it */
  abandoned = false;
  private executing = false;
  private complete = false;

  /** @param bufferedRows rows the stream holds before the socket is paused */
  constructor(text: string, values: unknown[], config: Omit<QueryStream.Config, 'batchSize' | 'highWaterMark'> & { bufferedRows: number }) {
    const { bufferedRows, ...rest } = config;
    super(text, values, { ...rest, highWaterMark: bufferedRows });
    const cursor = this.cursor;
    this.handleDataRow = (message: { fields: unknown[] }) => {
      if (this.destroyed) return;
      if (!this.push(cursor._result.parseRow(message.fields))) cursor.connection.stream.pause();
    };
  }

  override _read(): void {
    if (this.executing) {
      this.cursor.connection?.stream.resume();
      return;
    }
    this.executing = true;
    // 0 rows: the whole result in one Execute.
    this.cursor.read(0, (error?: Error) => {
      this.complete = true;
      if (error) this.destroy(error);
      else this.push(null);
    });
  }

  override _destroy(error: Error | null, callback: (error?: Error | null) => void): void {
    if (this.executing && !this.complete) {
      this.abandoned = true;
      callback(error);
      return;
    }
    super._destroy(error as Error, callback);
  }
}
