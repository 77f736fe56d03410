import { Equals, IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, MaxLength, Min } from 'class-validator';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { validateBody } from '../shared/validate-body';
import { QUANTITIES, type Quantity } from '../values/value-vocabulary';
import { ReleaseEditingService, releaseLabel } from './release-editing.service';

class OpenReleaseDto {
  @Matches(/^[0-9]{4}\.[1-9][0-9]*$/, { message: 'label must be the year and a number, e.g. 2027.2' })
  label: string;

  @IsOptional()
  @IsString()
  @MaxLength(50_000)
  notes?: string;
}

class AddProposalDto {
  @IsUUID('all', { message: 'proposalId must be the UUID of an approved proposal' })
  proposalId: string;
}

class RecommendDto {
  @IsUUID('all', { message: 'speciesPhaseId must be a UUID' })
  speciesPhaseId: string;

  @IsIn(QUANTITIES, { message: `quantity must be one of ${QUANTITIES.join(', ')}` })
  quantity: Quantity;

  @IsOptional()
  @IsUUID('all', { message: 'valueId must be a UUID' })
  valueId?: string;

  @IsOptional()
  @IsUUID('all', { message: 'fitId must be a UUID' })
  fitId?: string;
}

class NotesDto {
  @IsString({ message: 'notes must be text' })
  @MaxLength(50_000)
  notes: string;
}

class PublishDto {
  @Equals(true, { message: 'send {"confirm": true}: a published release can never change' })
  confirm: boolean;

  /** the release version the editor reviewed (optional optimistic lock) */
  @IsOptional()
  @IsInt()
  @Min(1)
  version?: number;
}

const EDITOR = { roles: ['editor' as const] };

/** The editor's release work; reading releases and diffs is the query API's (releases.routes.ts). */
export function releaseEditingRoutes(ctx: AppContext) {
  const releases = new ReleaseEditingService(ctx);
  const r = securedRouter('/releases', ctx.config.publicRead);

  r.post('/', EDITOR, async (req, res) => {
    const body = await validateBody(OpenReleaseDto, req.body);
    res.status(201).json(await releases.open(req.user!, body, req));
  });

  /** The release as the editor assembles it: its proposals, the groups still without one recommended member, the change log so far. */
  r.get('/:label/workspace', EDITOR, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await releases.view(releaseLabel(req.params.label)));
  });

  r.post('/:label/proposals', EDITOR, async (req, res) => {
    const label = releaseLabel(req.params.label);
    const body = await validateBody(AddProposalDto, req.body);
    res.json(await releases.addProposal(req.user!, label, body.proposalId.toLowerCase(), req));
  });

  r.put('/:label/recommended', EDITOR, async (req, res) => {
    const label = releaseLabel(req.params.label);
    const body = await validateBody(RecommendDto, req.body);
    res.json(await releases.recommend(req.user!, label, { ...body, speciesPhaseId: body.speciesPhaseId.toLowerCase(), valueId: body.valueId?.toLowerCase(), fitId: body.fitId?.toLowerCase() }, req));
  });

  r.patch('/:label', EDITOR, async (req, res) => {
    const label = releaseLabel(req.params.label);
    const body = await validateBody(NotesDto, req.body);
    res.json(await releases.updateNotes(req.user!, label, body.notes, req));
  });

  r.post('/:label/publish', EDITOR, async (req, res) => {
    const label = releaseLabel(req.params.label);
    const body = await validateBody(PublishDto, req.body);
    res.json(await releases.publish(req.user!, label, body.version, req));
  });

  return r.router;
}
