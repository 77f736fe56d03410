import { Signal, inject } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { catchError, distinctUntilChanged, map, of, switchMap } from 'rxjs';

import { CatalogueApi, CatalogueSpecies } from '../shared/catalogue/catalogue-api';

/**
 * The latest published record of the species with the given id (null for none, or a species this
 * proposal adds), reloaded when the id changes. Call in an injection context.
 */
export function catalogueRecord(speciesId: Signal<string | null>): Signal<CatalogueSpecies | null> {
  const catalogue = inject(CatalogueApi);
  return toSignal(
    toObservable(speciesId).pipe(
      distinctUntilChanged(),
      switchMap((id) => (id ? catalogue.species(id).pipe(catchError(() => of(null))) : of(null))),
      map((record) => record ?? null),
    ),
    { initialValue: null },
  );
}
