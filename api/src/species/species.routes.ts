import { replicaReads } from '../db/replica-reads';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { openApiValidation } from '../openapi/request-validation';
import { releaseResolver } from '../releases/release-resolution';
import { BadRequestError } from '../shared/errors';
import { releaseResponses } from '../shared/release-response-cache';
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
  const answers = releaseResponses(ctx);

  r.get('/', 'read', ...validate, async (req, res) => {
    const filter = speciesFilterFromQuery(req);
    const page = {
      page: queryInt(req, 'page', 1, 1, 100_000),
      pageSize: queryInt(req, 'pageSize', 25, 1, MAX_PAGE_SIZE),
      sort: queryEnum(req, 'sort', SORTS),
    };
    const release = await releases.fromQuery(req);
    await answers.sendJson(req, res, release, () => species.search(release, filter, page));
  });

  r.get('/:id', 'read', ...validate, async (req, res) => {
    const id = uuidParam(req.params.id);
    const release = await releases.fromQuery(req);
    await answers.sendJson(req, res, release, () => species.detail(release, id));
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
    const phase = phaseText === undefined ? undefined : phaseFromText(phaseText);
    const release = await releases.fromQuery(req);
    await answers.sendJson(req, res, release, () => properties.table(release, { speciesId: id, phase, polymorph, temperatures: temps, units, extrapolate }));
  });

  return r.router;
}
