import { pipeline } from 'node:stream/promises';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { uuidParam } from '../shared/params';
import { queryEnum } from '../shared/query-params';
import { EvidenceService } from './evidence.service';

/** Downloading evidence files (uploads go through the proposal items they back). */
export function evidenceRoutes(ctx: AppContext) {
  const evidence = new EvidenceService(ctx);
  const r = securedRouter('/evidence', ctx.config.publicRead);

  /** The bytes as uploaded (default), or `?meta=true` for the record: name, type, size, SHA-256. */
  r.get('/:id', 'signed-in', async (req, res) => {
    const id = uuidParam(req.params.id);
    const { file, body } = await evidence.download(req.user!, id);
    if (queryEnum(req, 'meta', ['true', 'false'] as const) === 'true') {
      body.destroy();
      res.set('Cache-Control', 'private, no-store').json(file);
      return;
    }
    res.set({
      'Content-Type': file.mediaType,
      'Content-Length': String(file.sizeBytes),
      'Content-Disposition': `attachment; filename="${file.fileName.replace(/[^\x20-\x7e]|"/g, '_')}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      'Cache-Control': 'private, no-store',
      ETag: `"${file.sha256}"`,
      'Repr-Digest': `sha-256=:${Buffer.from(file.sha256, 'hex').toString('base64')}:`,
      'Content-Security-Policy': "default-src 'none'; sandbox",
    });
    await pipeline(body, res);
  });

  return r.router;
}
