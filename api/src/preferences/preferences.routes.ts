import { IsIn } from 'class-validator';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { recordAudit } from '../audit/audit.service';
import { validateBody } from '../shared/validate-body';
import { ANY_ROLE } from '../watchlists/watchlists.routes';

export const ENERGY_UNITS = ['kJ', 'kcal'] as const;

/** A user's display settings; the API itself always answers in SI. */
export interface Preferences {
  /** energies shown in kJ/mol or kcal/mol (thermochemical calorie) */
  energyUnit: (typeof ENERGY_UNITS)[number];
}

const DEFAULTS: Preferences = { energyUnit: 'kJ' };

class PreferencesDto {
  @IsIn(ENERGY_UNITS, { message: `energyUnit must be one of ${ENERGY_UNITS.join(', ')}` })
  energyUnit: Preferences['energyUnit'];
}

/** `/me/preferences`: read and replace the caller's preferences (users.preferences). */
export function preferencesRoutes(ctx: AppContext) {
  const r = securedRouter('/me', ctx.config.publicRead);

  r.get('/preferences', ANY_ROLE, async (req, res) => {
    const [row] = await ctx.dataSource.query(`SELECT preferences FROM users WHERE id = $1`, [req.user!.userId]);
    res.set('Cache-Control', 'no-store').json({ ...DEFAULTS, ...(row?.preferences ?? {}) });
  });

  r.put('/preferences', ANY_ROLE, async (req, res) => {
    const body = await validateBody(PreferencesDto, req.body);
    const preferences: Preferences = { ...DEFAULTS, energyUnit: body.energyUnit };
    await ctx.dataSource.transaction(async (m) => {
      await m.query(`UPDATE users SET preferences = $2 WHERE id = $1`, [req.user!.userId, JSON.stringify(preferences)]);
      await recordAudit(m, { action: 'user.preferences', actor: req.user!, entityType: 'user', entityId: req.user!.userId, details: { ...preferences } }, req);
    });
    res.json(preferences);
  });

  return r.router;
}
