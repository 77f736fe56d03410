import { Component, input } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { AuthService } from '../../core/auth';
import { Proposal } from './proposal';
import { proposalResolver } from './proposal-resolver';

@Component({ template: '<p>editing {{ proposal().title }}</p>' })
class EditorPage {
  readonly proposal = input.required<Proposal>();
}

@Component({ template: '<p>somewhere else</p>' })
class OtherPage {}

const proposal = { id: 'p1', title: 'Propan-1-ol ΔfH°', author: { id: 'u-steward', name: 'Tomasz Okafor' } } as Proposal;

describe('proposalResolver', () => {
  let backend: HttpTestingController;
  let userId: string;

  beforeEach(() => {
    userId = 'u-steward';
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter(
          [
            { path: 'proposals/:id', component: EditorPage, resolve: { proposal: proposalResolver({ authorOnly: true }) } },
            { path: 'reviews/:id', component: OtherPage },
            { path: '**', component: OtherPage },
          ],
          withComponentInputBinding(),
        ),
        { provide: AuthService, useValue: { user: () => ({ id: userId, roles: [] }) } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  async function open(url: string, answer: (request: ReturnType<HttpTestingController['expectOne']>) => void): Promise<RouterTestingHarness> {
    const harness = await RouterTestingHarness.create();
    const navigation = harness.navigateByUrl(url);
    await new Promise((resolve) => setTimeout(resolve));
    answer(backend.expectOne('/api/v1/proposals/p1'));
    await navigation;
    return harness;
  }

  it('hands the loaded proposal to its author’s page', async () => {
    const harness = await open('/proposals/p1', (request) => request.flush(proposal));
    expect(harness.routeNativeElement!.textContent).toContain('editing Propan-1-ol ΔfH°');
  });

  it('sends a reader who did not write it to the review page', async () => {
    userId = 'u-reviewer';
    await open('/proposals/p1', (request) => request.flush(proposal));
    expect(TestBed.inject(Router).url).toBe('/reviews/p1');
  });

  it('shows the not-found page for a proposal the reader may not see', async () => {
    const harness = await open('/proposals/p1', (request) =>
      request.flush({ error: 'not_found', message: 'No proposal p1' }, { status: 404, statusText: 'Not Found' }),
    );
    expect(harness.routeNativeElement!.textContent).toContain('somewhere else');
    expect(TestBed.inject(Router).url).toBe('/not-found');
  });
});
