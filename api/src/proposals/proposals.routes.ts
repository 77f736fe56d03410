import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { EvidenceService } from '../evidence/evidence.service';
import { uuidParam } from '../shared/params';
import { queryEnum, queryInt, queryText } from '../shared/query-params';
import { BadRequestError } from '../shared/errors';
import { receiveOneFile, requireFile } from '../shared/uploads';
import { validateBody } from '../shared/validate-body';
import { proposalImpact } from './proposal-impact';
import { PROPOSAL_STATES, type ProposalState } from './proposal-vocabulary';
import { CommentDto, CreateItemDto, CreateProposalDto, ReviewDto, TransitionDto, UpdateItemDto } from './proposals.dto';
import { PROPOSAL_SORTS, ProposalsService } from './proposals.service';

const STEWARD = { roles: ['steward' as const] };
const REVIEWER = { roles: ['reviewer' as const] };
/** Everyone in the editorial workflow; what each sees is narrowed by the service. */
const WORKFLOW = { roles: ['steward' as const, 'reviewer' as const, 'editor' as const, 'admin' as const] };

/** Proposals: drafting, submitting, reviewing, comments, impact and evidence uploads. */
export function proposalsRoutes(ctx: AppContext) {
  const proposals = new ProposalsService(ctx);
  const evidence = new EvidenceService(ctx);
  const r = securedRouter('/proposals', ctx.config.publicRead);

  r.get('/', WORKFLOW, async (req, res) => {
    const states = queryText(req, 'state')?.split(',').map((s) => s.trim()).filter(Boolean);
    const unknown = states?.filter((s) => !(PROPOSAL_STATES as readonly string[]).includes(s));
    if (unknown?.length) throw new BadRequestError(`state must be one or more of ${PROPOSAL_STATES.join(', ')} (comma-separated), got "${unknown.join(', ')}"`);
    const flag = (name: string) => queryEnum(req, name, ['true', 'false'] as const) === 'true';
    const sort = queryEnum(req, 'sort', Object.keys(PROPOSAL_SORTS)) ?? '-updatedAt';
    res.set('Cache-Control', 'no-store').json(await proposals.list(req.user!, {
      states: states as ProposalState[] | undefined,
      mine: flag('mine'),
      assignedToMe: flag('assignedToMe'),
      sort,
      limit: queryInt(req, 'limit', 50, 1, 500),
      offset: queryInt(req, 'offset', 0, 0, 10_000_000),
    }));
  });

  r.post('/', STEWARD, async (req, res) => {
    const body = await validateBody(CreateProposalDto, req.body);
    res.status(201).json(await proposals.create(req.user!, body, req));
  });

  r.get('/:id', WORKFLOW, async (req, res) => {
    const page = { offset: queryInt(req, 'itemOffset', 0, 0, 10_000_000), limit: queryInt(req, 'itemLimit', 500, 1, 5000) };
    res.set('Cache-Control', 'no-store').json(await proposals.get(req.user!, uuidParam(req.params.id), page));
  });

  r.post('/:id/items', STEWARD, async (req, res) => {
    const id = uuidParam(req.params.id);
    const body = await validateBody(CreateItemDto, req.body);
    res.status(201).json(await proposals.addItem(req.user!, id, body, req));
  });

  r.patch('/:id/items/:itemId', STEWARD, async (req, res) => {
    const id = uuidParam(req.params.id);
    const itemId = uuidParam(req.params.itemId, 'itemId');
    const body = await validateBody(UpdateItemDto, req.body);
    if (body.payload === undefined && body.sourceId === undefined) throw new BadRequestError('Send payload, sourceId or both');
    res.json(await proposals.updateItem(req.user!, id, itemId, body, req));
  });

  r.delete('/:id/items/:itemId', STEWARD, async (req, res) => {
    await proposals.deleteItem(req.user!, uuidParam(req.params.id), uuidParam(req.params.itemId, 'itemId'), req);
    res.status(204).end();
  });

  r.post('/:id/items/:itemId/evidence', STEWARD,
    async (req, _res, next) => {
      // Who may attach is settled before the body is read into memory.
      await evidence.assertMayAttach(req.user!, uuidParam(req.params.id), uuidParam(req.params.itemId, 'itemId'));
      next();
    },
    receiveOneFile(ctx.config.uploadLimitBytes),
    async (req, res) => {
      const file = requireFile(req.file);
      const description = typeof req.body?.description === 'string' ? req.body.description.slice(0, 2000) : undefined;
      res.status(201).json(await evidence.upload(req.user!, uuidParam(req.params.id), uuidParam(req.params.itemId, 'itemId'), file, description, req));
    });

  r.post('/:id/submit', STEWARD, async (req, res) => {
    const body = await validateBody(TransitionDto, req.body ?? {});
    res.json(await proposals.submit(req.user!, uuidParam(req.params.id), body.version, req, 'submit'));
  });

  r.post('/:id/resubmit', STEWARD, async (req, res) => {
    const body = await validateBody(TransitionDto, req.body ?? {});
    res.json(await proposals.submit(req.user!, uuidParam(req.params.id), body.version, req, 'resubmit'));
  });

  r.post('/:id/withdraw', STEWARD, async (req, res) => {
    const body = await validateBody(TransitionDto, req.body ?? {});
    res.json(await proposals.withdraw(req.user!, uuidParam(req.params.id), body.version, req));
  });

  r.post('/:id/reviews', REVIEWER, async (req, res) => {
    const id = uuidParam(req.params.id);
    const body = await validateBody(ReviewDto, req.body);
    res.status(201).json(await proposals.review(req.user!, id, body, req));
  });

  r.get('/:id/comments', WORKFLOW, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await proposals.comments(req.user!, uuidParam(req.params.id)));
  });

  r.post('/:id/comments', WORKFLOW, async (req, res) => {
    const id = uuidParam(req.params.id);
    const body = await validateBody(CommentDto, req.body);
    res.status(201).json(await proposals.addComment(req.user!, id, body, req));
  });

  r.get('/:id/impact', WORKFLOW, async (req, res) => {
    const id = uuidParam(req.params.id);
    await proposals.findVisible(ctx.dataSource.manager, id, req.user!);
    res.set('Cache-Control', 'no-store').json({ proposalId: id, ...(await proposalImpact(ctx.dataSource.manager, id)) });
  });

  return r.router;
}
