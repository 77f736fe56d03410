import { HttpErrorResponse } from '@angular/common/http';
import { Observable, catchError, map, of, startWith } from 'rxjs';

import { describeHttpError } from '../../core/api-error';

/** Something a page loads: still loading, loaded, or failed with a sentence saying why. */
export type Loadable<T> =
  | { readonly state: 'loading' }
  | { readonly state: 'ok'; readonly value: T }
  | { readonly state: 'failed'; readonly message: string; readonly status: number | null };

/**
 * Wraps a request so that a template can switch on its state: `loading` first, then `ok` with
 * the value or `failed` with the API's message (and the HTTP status, e.g. 404 for a page that
 * shows its own not-found state).
 */
export function loadable<T>(source: Observable<T>): Observable<Loadable<T>> {
  return source.pipe(
    map((value): Loadable<T> => ({ state: 'ok', value })),
    catchError((error: unknown) => of<Loadable<T>>(failure(error))),
    startWith<Loadable<T>>({ state: 'loading' }),
  );
}

/** The value when loaded, else `fallback`. */
export function loadedOr<T, F>(item: Loadable<T>, fallback: F): T | F {
  return item.state === 'ok' ? item.value : fallback;
}

function failure(error: unknown): { state: 'failed'; message: string; status: number | null } {
  if (error instanceof HttpErrorResponse) {
    return { state: 'failed', message: describeHttpError(error), status: error.status };
  }
  return { state: 'failed', message: error instanceof Error ? error.message : 'Something went wrong.', status: null };
}
