import { pipeline } from 'node:stream/promises';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { openApiValidation } from '../openapi/request-validation';
import { releaseResolver } from '../releases/release-resolution';
import { setReleaseCaching } from '../shared/http-cache';
import { queryEnum } from '../shared/query-params';
import { speciesFilterFromQuery } from '../species/species-filter';
import { CONTENT_TYPES, csvStages, EXPORT_FORMATS, FILE_EXTENSIONS, stagesFor, type ExportHeader } from './export-formats';
import { ExportService } from './export.service';

/**
 * Exports of what a release holds, with the search filters: CSV, JSON, XML, or NASA-7
 * polynomials in the TM-4513 layout, streamed from a database cursor.
 */
export function exportRoutes(ctx: AppContext) {
  const r = securedRouter('/export', ctx.config.publicRead);
  const validate = openApiValidation(ctx);
  const releases = releaseResolver(ctx.dataSource);
  const exports = new ExportService(ctx.dataSource);

  r.get('/', 'read', ...validate, async (req, res) => {
    const format = queryEnum(req, 'format', EXPORT_FORMATS) ?? 'csv';
    const options = {
      filter: speciesFilterFromQuery(req),
      recommendedOnly: queryEnum(req, 'recommendedOnly', ['true', 'false'] as const) === 'true',
    };
    const release = await releases.fromQuery(req);
    const query = new URLSearchParams(
      Object.entries(req.query)
        .filter((e): e is [string, string] => typeof e[1] === 'string')
        .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)),
    ).toString();

    setReleaseCaching(res, release, ctx.config.publicRead);
    if (release.status === 'published') {
      res.set('ETag', await exports.etag(release, query));
      if (req.fresh) {
        res.status(304).end();
        return;
      }
    }
    const kind = format === 'nasa7' ? 'nasa7' : 'all';
    // CSV is written from COPY text, the other formats from rows as objects.
    const { cursor, stagesOf } = format === 'csv'
      ? await exports.csvCopy(release, options).then((copy) => ({ cursor: copy, stagesOf: (h: ExportHeader) => csvStages(h, copy.columnTypes) }))
      : { cursor: await (kind === 'nasa7' ? exports.nasa7(release, options) : exports.rows(release, options)), stagesOf: (h: ExportHeader) => stagesFor(format, h) };
    try {
      // Ask for the first rows now: the database sorts the export while the header's sources are
      // looked up. A failure meanwhile is thrown below (or by the pipeline, once it runs).
      cursor.stream.on('error', () => undefined).read(0);
      const sources = await exports.sources(release, options, kind);
      if (cursor.stream.errored) throw cursor.stream.errored;
      res.set('Content-Type', CONTENT_TYPES[format]);
      res.set('Content-Disposition', `attachment; filename="kelvindex-${release.label}.${FILE_EXTENSIONS[format]}"`);
      res.set('X-Kelvindex-Release', release.label);
      // No generation time: an export of a published release is the same bytes forever (ETags, backups).
      const header = { release: { label: release.label, status: release.status, publishedAt: release.publishedAt }, query, sources };
      await pipeline([cursor.stream, ...stagesOf(header), res]);
    } catch (error) {
      // The client went away (before or during the answer): there is no one to tell.
      if ((error as NodeJS.ErrnoException).code === 'ERR_STREAM_PREMATURE_CLOSE') return;
      // Headers are gone once the first bytes are: a failure mid-stream can only cut the answer short.
      if (!res.headersSent) throw error;
      if (!res.destroyed) {
        console.error(error);
        res.destroy(error as Error);
      }
    } finally {
      await cursor.done();
    }
  });

  return r.router;
}
