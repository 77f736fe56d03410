import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';

import { CommentThread } from './comment-thread';
import { PostedComment, ProposalComment } from './proposal';

const comments: ProposalComment[] = [
  { id: 'c1', itemId: 'i1', author: { id: 'u2', name: 'Ines Marchetti' }, body: 'Which sapphire runs?', createdAt: '2026-10-01T10:00:00Z', editedAt: null },
  { id: 'c2', itemId: null, author: { id: 'u2', name: 'Ines Marchetti' }, body: 'Overall fine.', createdAt: '2026-10-01T10:05:00Z', editedAt: null },
];

describe('CommentThread', () => {
  let fixture: ComponentFixture<CommentThread>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(CommentThread);
    fixture.componentRef.setInput('proposalId', 'p1');
    fixture.componentRef.setInput('itemId', 'i1');
    fixture.componentRef.setInput('comments', comments);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('shows only the comments on its item', () => {
    const shown = Array.from(element().querySelectorAll('.kx-comment-body')).map((p) => p.textContent);
    expect(shown).toEqual(['Which sapphire runs?']);
  });

  it('refuses an empty comment', async () => {
    element().querySelector<HTMLButtonElement>('.kx-post-comment')!.click();
    await fixture.whenStable();
    expect(element().querySelector('mat-error')!.textContent).toContain('Write the comment first.');
    backend.expectNone('/api/v1/proposals/p1/comments');
  });

  it('posts a trimmed comment on its item and emits it', async () => {
    const posted: PostedComment[] = [];
    fixture.componentInstance.posted.subscribe((comment) => posted.push(comment));
    const textarea = element().querySelector('textarea')!;
    textarea.value = '  Runs S-1 to S-4 are attached.  ';
    textarea.dispatchEvent(new Event('input'));
    element().querySelector<HTMLButtonElement>('.kx-post-comment')!.click();
    const request = backend.expectOne('/api/v1/proposals/p1/comments');
    expect(request.request.body).toEqual({ body: 'Runs S-1 to S-4 are attached.', itemId: 'i1' });
    request.flush({ ...comments[0], id: 'c3', body: 'Runs S-1 to S-4 are attached.', proposalState: 'changes_requested', proposalVersion: 4 });
    await fixture.whenStable();
    expect(posted.length).toBe(1);
    expect(textarea.value).toBe('');
  });

  it('hides the box when the reader may not comment', async () => {
    fixture.componentRef.setInput('canComment', false);
    await fixture.whenStable();
    expect(element().querySelector('form')).toBeNull();
  });
});
