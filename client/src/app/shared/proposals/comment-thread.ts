import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import { PostedComment, ProposalComment } from './proposal';
import { ProposalsApi } from './proposals-api';

let nextThreadId = 0;

/**
 * The comments on one item (or on the whole proposal when `itemId` is null), oldest first, with a
 * box to add one. Reviewers comment; authors answer.
 */
@Component({
  selector: 'kx-comment-thread',
  imports: [DatePipe, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  template: `
    @if (thread().length > 0) {
      <ol class="kx-comments" [attr.aria-label]="heading()">
        @for (comment of thread(); track comment.id) {
          <li>
            <p class="kx-comment-meta">
              <strong>{{ comment.author.name }}</strong>
              <time [attr.datetime]="comment.createdAt">{{ comment.createdAt | date: 'yyyy-MM-dd HH:mm' }}</time>
            </p>
            <p class="kx-comment-body">{{ comment.body }}</p>
          </li>
        }
      </ol>
    } @else {
      <p class="kx-comments-none">{{ emptyText() }}</p>
    }
    @if (canComment()) {
      <form class="kx-comment-form" [formGroup]="form" (ngSubmit)="postComment()" [attr.aria-label]="formLabel()">
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>{{ formLabel() }}</mat-label>
          <textarea matInput [id]="fieldId" formControlName="body" rows="2"></textarea>
          @if (body.hasError('required') && body.touched) {
            <mat-error>Write the comment first.</mat-error>
          }
        </mat-form-field>
        <button mat-stroked-button type="submit" class="kx-post-comment" [disabled]="posting()">{{ buttonText() }}</button>
      </form>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .kx-comments {
      margin: 0 0 0.5rem;
      padding: 0;
      list-style: none;
    }
    li {
      padding: 0.35rem 0.75rem;
      margin-bottom: 0.35rem;
      border-inline-start: 3px solid var(--mat-sys-outline-variant);
    }
    .kx-comment-meta {
      display: flex;
      gap: 0.75rem;
      margin: 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-comment-body {
      margin: 0.15rem 0 0;
      white-space: pre-wrap;
    }
    .kx-comments-none {
      margin: 0 0 0.5rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .kx-comment-form {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem;
      align-items: flex-start;
      mat-form-field {
        flex: 1 1 18rem;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CommentThread {
  private readonly proposals = inject(ProposalsApi);

  readonly proposalId = input.required<string>();
  readonly itemId = input<string | null>(null);
  readonly comments = input.required<readonly ProposalComment[]>();
  readonly canComment = input(true);
  /** Words on the box: "Comment on this item", "Answer the reviewer"… */
  readonly formLabel = input('Comment');
  readonly buttonText = input('Add comment');
  readonly emptyText = input('No comments yet.');
  readonly posted = output<PostedComment>();

  protected readonly fieldId = `kx-comment-${nextThreadId++}`;
  protected readonly body = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(20000)] });
  protected readonly form = new FormGroup({ body: this.body });
  protected readonly posting = signal(false);
  protected readonly thread = computed(() => this.comments().filter((comment) => (comment.itemId ?? null) === this.itemId()));
  protected readonly heading = computed(() => (this.itemId() ? 'Comments on this item' : 'Comments on the proposal'));

  protected postComment(): void {
    if (this.body.value.trim() === '') {
      this.body.setValue('');
    }
    if (this.body.invalid) {
      this.body.markAsTouched();
      return;
    }
    this.posting.set(true);
    this.proposals.addComment(this.proposalId(), this.body.value.trim(), this.itemId()).subscribe({
      next: (comment) => {
        this.posting.set(false);
        this.body.reset();
        this.posted.emit(comment);
      },
      error: () => this.posting.set(false),
    });
  }
}
