import { replicaReads } from '../db/replica-reads';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { openApiValidation } from '../openapi/request-validation';
import { releaseResolver } from '../releases/release-resolution';
import { temperatures } from '../shared/temperatures';
import { validateBody } from '../shared/validate-body';
import { AdiabaticRiseDto, DeriveFormationDto, EquationDto, EvaluateReactionDto } from './reaction-compute.dto';
import { ReactionComputeService } from './reaction-compute.service';

/**
 * Computations on reactions. They change nothing, so they take 'read' access like the data they
 * read; they are POSTs because an equation and a temperature list do not fit a URL well.
 */
export function reactionComputeRoutes(ctx: AppContext) {
  const r = securedRouter('/reactions', ctx.config.publicRead);
  const validate = openApiValidation(ctx);
  const reads = replicaReads(ctx.dataSource);
  const releases = releaseResolver(reads);
  const reactions = new ReactionComputeService(reads);

  r.post('/evaluate', 'read', ...validate, async (req, res) => {
    const body = await validateBody(EvaluateReactionDto, req.body);
    const temps = temperatures(
      { list: body.temperatures, tMin: body.tMin, tMax: body.tMax, tStep: body.tStep },
      { list: 'temperatures', tMin: 'tMin', tMax: 'tMax', tStep: 'tStep' },
    );
    const release = await releases.resolve(req, body.release);
    res.set('Cache-Control', 'no-store').json(await reactions.evaluate(release, body.equation, temps, body.extrapolate ?? false));
  });

  r.post('/balance', 'read', ...validate, async (req, res) => {
    const body = await validateBody(EquationDto, req.body);
    res.set('Cache-Control', 'no-store').json(reactions.balance(body.equation));
  });

  r.post('/derive-formation', 'read', ...validate, async (req, res) => {
    const body = await validateBody(DeriveFormationDto, req.body);
    const release = await releases.resolve(req, body.release);
    res.set('Cache-Control', 'no-store').json(await reactions.deriveFormation(release, body.equation, body.target, body.reactionEnthalpy));
  });

  r.post('/adiabatic-rise', 'read', ...validate, async (req, res) => {
    const body = await validateBody(AdiabaticRiseDto, req.body);
    res.set('Cache-Control', 'no-store').json(reactions.adiabaticRise(body));
  });

  return r.router;
}
