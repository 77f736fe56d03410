import { replicaReads } from '../db/replica-reads';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { openApiValidation } from '../openapi/request-validation';
import { releaseResolver } from '../releases/release-resolution';
import { BadRequestError } from '../shared/errors';
import { setReleaseCaching } from '../shared/http-cache';
import { uuidParam } from '../shared/params';
import { queryEnum, queryInt, queryText } from '../shared/query-params';
import { splitList, temperatures } from '../shared/temperatures';
import { MAX_PAGE_SIZE, phaseFromText, SORTS, speciesFilterFromQuery } from './species-filter';
import { SpeciesPropertiesService } from './species-properties.service';
import { SpeciesService } from './species.service';

/** Search, detail and property tables of species, each answered from one release. */
export function speciesRoutes(ctx: AppContext) {
  const validate = openApiValidation(ctx);
  const r = securedRouter('/species', ctx.config.publicRead);
  const reads = replicaReads(ctx.dataSource);
  const releases = releaseResolver(reads);
  const species = new SpeciesService(reads);
  const properties = new SpeciesPropertiesService(reads);

  r.get('/', 'read', ...validate, async (req, res) => {
    const filter = speciesFilterFromQuery(req);
    const page = {
      page: queryInt(req, 'page', 1, 1, 100_000),
      pageSize: queryInt(req, 'pageSize', 25, 1, MAX_PAGE_SIZE),
      sort: queryEnum(req, 'sort', SORTS),
    };
    const release = await releases.fromQuery(req);
    const result = await species.search(release, filter, page);
    setReleaseCaching(res, release, ctx.config.publicRead);
    res.json(result);
  });

  r.get('/:id', 'read', ...validate, async (req, res) => {
    const id = uuidParam(req.params.id);
    const release = await releases.fromQuery(req);
    const detail = await species.detail(release, id);
    setReleaseCaching(res, release, ctx.config.publicRead);
    res.json(detail);
  });

  r.get('/:id/properties', 'read', ...validate, async (req, res) => {
    const id = uuidParam(req.params.id);
    const phaseText = queryText(req, 'phase');
    const temps = temperatures(
      { list: splitList(queryText(req, 'T')), tMin: queryText(req, 'Tmin'), tMax: queryText(req, 'Tmax'), tStep: queryText(req, 'Tstep') },
      { list: 'T', tMin: 'Tmin', tMax: 'Tmax', tStep: 'Tstep' },
    );
    const extrapolate = queryEnum(req, 'extrapolate', ['true', 'false'] as const) === 'true';
    const units = queryEnum(req, 'units', ['kJ', 'kcal'] as const) ?? 'kJ';
    const polymorph = queryText(req, 'polymorph');
    if (polymorph !== undefined && polymorph.trim() === '') throw new BadRequestError('polymorph must not be blank', { parameter: 'polymorph' });
    const release = await releases.fromQuery(req);
    const table = await properties.table(release, {
      speciesId: id,
      phase: phaseText === undefined ? undefined : phaseFromText(phaseText),
      polymorph,
      temperatures: temps,
      units,
      extrapolate,
    });
    setReleaseCaching(res, release, ctx.config.publicRead);
    res.json(table);
  });

  return r.router;
}
