import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { ROLES } from '../auth/principal';
import { uuidParam } from '../shared/params';
import { WatchlistsService } from './watchlists.service';

/** Any signed-in user with a role (API keys need the write scope to change the list). */
export const ANY_ROLE = { roles: [...ROLES] };

/** The caller's watchlist of species. */
export function watchlistRoutes(ctx: AppContext) {
  const watchlists = new WatchlistsService(ctx);
  const r = securedRouter('/watchlist', ctx.config.publicRead);

  r.get('/', ANY_ROLE, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await watchlists.list(req.user!));
  });

  r.put('/:speciesId', ANY_ROLE, async (req, res) => {
    const { item, created } = await watchlists.watch(req.user!, uuidParam(req.params.speciesId, 'speciesId'), req);
    res.status(created ? 201 : 200).json(item);
  });

  r.delete('/:speciesId', ANY_ROLE, async (req, res) => {
    await watchlists.unwatch(req.user!, uuidParam(req.params.speciesId, 'speciesId'), req);
    res.status(204).end();
  });

  return r.router;
}
