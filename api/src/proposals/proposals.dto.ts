import { IsIn, IsInt, IsObject, IsOptional, IsString, IsUUID, Length, MaxLength, Min, MinLength, ValidateIf } from 'class-validator';
import { PROPOSAL_ITEM_KINDS, REVIEW_DECISIONS, type ProposalItemKind, type ReviewDecision } from './proposal-vocabulary';

export class CreateProposalDto {
  @IsString()
  @Length(1, 300, { message: 'title must be 1 to 300 characters' })
  title: string;

  @IsOptional()
  @IsString()
  @MaxLength(20000)
  summary?: string;
}

export class CreateItemDto {
  @IsIn(PROPOSAL_ITEM_KINDS, { message: `kind must be one of ${PROPOSAL_ITEM_KINDS.join(', ')}` })
  kind: ProposalItemKind;

  @IsObject({ message: 'payload must be an object' })
  payload: Record<string, unknown>;

  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsUUID('all', { message: 'sourceId must be a UUID' })
  sourceId?: string | null;
}

export class UpdateItemDto {
  @IsOptional()
  @IsObject({ message: 'payload must be an object' })
  payload?: Record<string, unknown>;

  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsUUID('all', { message: 'sourceId must be a UUID' })
  sourceId?: string | null;
}

/** Body of submit, resubmit and withdraw: the proposal version the author saw (optional). */
export class TransitionDto {
  @IsOptional()
  @IsInt({ message: 'version must be an integer' })
  @Min(1)
  version?: number;
}

export class ReviewDto {
  @IsIn(REVIEW_DECISIONS, { message: `decision must be one of ${REVIEW_DECISIONS.join(', ')}` })
  decision: ReviewDecision;

  @IsOptional()
  @IsString()
  @MaxLength(20000)
  comment?: string;

  /** why a failed automatic check does not block the approval */
  @IsOptional()
  @IsString()
  @MinLength(1)
  @MaxLength(20000)
  justification?: string;

  /** the proposal version the reviewer saw (optimistic locking) */
  @IsInt({ message: 'version must be the integer version of the proposal you reviewed' })
  @Min(1)
  version: number;
}

export class CommentDto {
  @IsString()
  @Length(1, 20000, { message: 'body must be 1 to 20000 characters' })
  body: string;

  @IsOptional()
  @IsUUID('all', { message: 'itemId must be a UUID' })
  itemId?: string;
}
