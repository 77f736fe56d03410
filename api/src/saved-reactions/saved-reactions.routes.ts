import { IsNumber, IsString, Length, Max, Min } from 'class-validator';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { uuidParam } from '../shared/params';
import { validateBody } from '../shared/validate-body';
import { ANY_ROLE } from '../watchlists/watchlists.routes';
import { SavedReactionsService } from './saved-reactions.service';

class SavedReactionDto {
  @IsString()
  @Length(1, 200, { message: 'name must be 1 to 200 characters' })
  name: string;

  @IsString()
  @Length(1, 2000, { message: 'equation must be 1 to 2000 characters, e.g. CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)' })
  equation: string;

  /** K */
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'tMin must be a temperature in K' })
  @Min(1e-6, { message: 'tMin must be above 0 K' })
  @Max(100_000)
  tMin: number;

  /** K */
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'tMax must be a temperature in K' })
  @Min(1e-6, { message: 'tMax must be above 0 K' })
  @Max(100_000)
  tMax: number;
}

/** The caller's saved reactions. */
export function savedReactionsRoutes(ctx: AppContext) {
  const saved = new SavedReactionsService(ctx);
  const r = securedRouter('/saved-reactions', ctx.config.publicRead);

  r.get('/', ANY_ROLE, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await saved.list(req.user!));
  });

  r.post('/', ANY_ROLE, async (req, res) => {
    const body = await validateBody(SavedReactionDto, req.body);
    res.status(201).json(await saved.create(req.user!, body, req));
  });

  r.delete('/:id', ANY_ROLE, async (req, res) => {
    await saved.remove(req.user!, uuidParam(req.params.id), req);
    res.status(204).end();
  });

  return r.router;
}
