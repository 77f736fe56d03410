import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';

import { API_BASE_URL } from '../../core/api-base-url';

/** A reaction kept in the account with the temperature range (K) it was evaluated over. */
export interface SavedReaction {
  readonly id: string | number;
  readonly name: string;
  readonly equation: string;
  readonly tMin: number;
  readonly tMax: number;
  readonly createdAt: string;
}

export type NewSavedReaction = Pick<SavedReaction, 'name' | 'equation' | 'tMin' | 'tMax'>;

/** The signed-in reader's saved reactions (`/api/v1/saved-reactions`). */
@Injectable({ providedIn: 'root' })
export class SavedReactionsService {
  private readonly http = inject(HttpClient);
  private readonly url = `${inject(API_BASE_URL)}/saved-reactions`;

  list(): Observable<readonly SavedReaction[]> {
    return this.http.get<{ items: SavedReaction[] }>(this.url).pipe(map((response) => response.items));
  }

  save(reaction: NewSavedReaction): Observable<SavedReaction> {
    return this.http.post<SavedReaction>(this.url, reaction);
  }

  remove(id: string | number): Observable<void> {
    return this.http.delete<void>(`${this.url}/${encodeURIComponent(id)}`);
  }
}

/** Query parameters that open a saved reaction on the reaction page. */
export function reactionPageParams(reaction: Pick<SavedReaction, 'equation' | 'tMin' | 'tMax'>): Record<string, string> {
  return { equation: reaction.equation, tMin: String(reaction.tMin), tMax: String(reaction.tMax) };
}
