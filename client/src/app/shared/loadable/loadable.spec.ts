import { HttpErrorResponse } from '@angular/common/http';
import { Subject, lastValueFrom, of, throwError, toArray } from 'rxjs';

import { Loadable, loadable, loadedOr } from './loadable';

describe('loadable', () => {
  it('starts loading, then carries the value', async () => {
    const states = await lastValueFrom(loadable(of(42)).pipe(toArray()));
    expect(states).toEqual([{ state: 'loading' }, { state: 'ok', value: 42 }]);
  });

  it('turns an API error into its message and status', async () => {
    const error = new HttpErrorResponse({ status: 404, error: { error: 'not_found', message: 'No proposal 7' } });
    const states = await lastValueFrom(loadable(throwError(() => error)).pipe(toArray()));
    expect(states[1]).toEqual({ state: 'failed', message: 'No proposal 7', status: 404 });
  });

  it('reports loading until the request answers', () => {
    const answer = new Subject<string>();
    const seen: Loadable<string>[] = [];
    loadable(answer).subscribe((state) => seen.push(state));
    expect(seen).toEqual([{ state: 'loading' }]);
    answer.next('done');
    expect(loadedOr(seen[1], '')).toBe('done');
    expect(loadedOr(seen[0], 'fallback')).toBe('fallback');
  });
});
