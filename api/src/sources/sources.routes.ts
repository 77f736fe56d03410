import { IsIn, IsOptional, IsString, IsUUID, Length } from 'class-validator';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { uuidParam } from '../shared/params';
import { queryEnum, queryInt, queryText } from '../shared/query-params';
import { validateBody } from '../shared/validate-body';
import { toBibtex, type BibliographyFormat } from './bibliography-formats';
import { SourcesService } from './sources.service';

class ImportSourcesDto {
  @IsString()
  @Length(1, 1_000_000, { message: 'text must hold the BibTeX or RIS entries (at most 1 000 000 characters)' })
  text: string;

  @IsOptional()
  @IsIn(['bibtex', 'ris'], { message: 'format must be bibtex or ris' })
  format?: BibliographyFormat;
}

class MergeDto {
  @IsUUID('all', { message: 'intoId must be the UUID of the source to keep' })
  intoId: string;
}

const EDITORIAL = { roles: ['steward' as const, 'editor' as const] };
const EDITOR = { roles: ['editor' as const] };

/** Bibliographic sources: search, create by hand or DOI, import BibTeX/RIS, export, merge duplicates. */
export function sourcesRoutes(ctx: AppContext) {
  const sources = new SourcesService(ctx);
  const r = securedRouter('/sources', ctx.config.publicRead);

  r.get('/', 'read', async (req, res) => {
    const q = queryText(req, 'q')?.trim().slice(0, 300);
    res.json(await sources.search(q || undefined, queryInt(req, 'limit', 50, 1, 500), queryInt(req, 'offset', 0, 0, 1_000_000)));
  });

  r.post('/', EDITORIAL, async (req, res) => {
    res.status(201).json(await sources.create(req.user!, req.body, req));
  });

  r.post('/import', EDITORIAL, async (req, res) => {
    const body = await validateBody(ImportSourcesDto, req.body);
    res.status(201).json(await sources.import(req.user!, body, req));
  });

  /** JSON record (default), `?format=csl-json` (the CSL-JSON item) or `?format=bibtex`. */
  r.get('/:id', 'read', async (req, res) => {
    const format = queryEnum(req, 'format', ['json', 'csl-json', 'bibtex'] as const) ?? 'json';
    const source = await sources.get(uuidParam(req.params.id));
    if (format === 'json') {
      res.json(source);
    } else if (format === 'csl-json') {
      res.type('application/vnd.citationstyles.csl+json').send(JSON.stringify({ ...source.csl, id: source.shortKey, ...(source.doi ? { DOI: source.doi } : {}) }, null, 2));
    } else {
      res.type('application/x-bibtex; charset=utf-8')
        .set('Content-Disposition', `inline; filename="${source.shortKey}.bib"`)
        .send(toBibtex({ ...source.csl, ...(source.doi ? { DOI: source.doi } : {}) }, source.shortKey));
    }
  });

  r.post('/:id/merge', EDITOR, async (req, res) => {
    const id = uuidParam(req.params.id);
    const body = await validateBody(MergeDto, req.body);
    res.json(await sources.merge(req.user!, id, body.intoId.toLowerCase(), req));
  });

  return r.router;
}
