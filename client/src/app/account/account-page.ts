import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, linkedSignal, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { Observable, Subject, catchError, map, of, startWith, switchMap } from 'rxjs';

import { AuthService } from '../core/auth';
import { PreferencesService } from '../core/preferences';
import { Formula } from '../shared/formula/formula';
import { LoadingIndicator } from '../shared/loading-indicator/loading-indicator';
import { SavedReaction, SavedReactionsService, reactionPageParams } from '../shared/saved-reactions/saved-reactions';
import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { UnitSelector } from '../shared/unit-selector/unit-selector';
import { WatchedSpecies, WatchlistService } from '../shared/watchlist/watchlist';
import { ApiKeysPanel } from './api-keys-panel';

type Listing<T> = { readonly state: 'loading' } | { readonly state: 'ok'; readonly items: readonly T[] } | { readonly state: 'failed' };

/** The signed-in reader's own things: who they are, units, API keys, watchlist and saved reactions. */
@Component({
  selector: 'kx-account-page',
  imports: [ApiKeysPanel, DatePipe, Formula, LoadingIndicator, MatButtonModule, RouterLink, UnitSelector],
  templateUrl: './account-page.html',
  styleUrls: ['./account-panels.scss', './account-page.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AccountPage {
  private readonly preferences = inject(PreferencesService);
  private readonly watchlist = inject(WatchlistService);
  private readonly savedReactions = inject(SavedReactionsService);
  private readonly watchReloads = new Subject<void>();
  private readonly reactionReloads = new Subject<void>();

  protected readonly user = inject(AuthService).user;
  protected readonly energyUnit = linkedSignal<MolarEnergyUnit>(() => this.preferences.energyUnit());
  protected readonly unitSaved = signal('');
  protected readonly announcement = signal('');

  protected readonly watched = toSignal(listing(this.watchReloads, () => this.watchlist.list()), {
    initialValue: { state: 'loading' } as Listing<WatchedSpecies>,
  });
  protected readonly reactions = toSignal(listing(this.reactionReloads, () => this.savedReactions.list()), {
    initialValue: { state: 'loading' } as Listing<SavedReaction>,
  });
  protected readonly watchedItems = computed(() => itemsOf(this.watched()));
  protected readonly reactionItems = computed(() =>
    itemsOf(this.reactions()).map((reaction) => ({ ...reaction, params: reactionPageParams(reaction) })),
  );

  protected saveUnit(unit: MolarEnergyUnit): void {
    this.energyUnit.set(unit);
    this.unitSaved.set('');
    this.preferences.saveEnergyUnit(unit).subscribe({
      next: () => this.unitSaved.set(`Saved: values are shown in ${unit} from now on.`),
      error: () => this.energyUnit.set(this.preferences.energyUnit()),
    });
  }

  protected stopWatching(species: WatchedSpecies): void {
    this.watchlist.unwatch(species.speciesId).subscribe(() => {
      this.announcement.set(`You stopped watching ${species.name}.`);
      this.watchReloads.next();
    });
  }

  protected deleteReaction(reaction: SavedReaction): void {
    this.savedReactions.remove(reaction.id).subscribe(() => {
      this.announcement.set(`Deleted the saved reaction ${reaction.name}.`);
      this.reactionReloads.next();
    });
  }
}

function listing<T>(reloads: Subject<void>, load: () => Observable<readonly T[]>): Observable<Listing<T>> {
  return reloads.pipe(
    startWith(undefined),
    switchMap(() =>
      load().pipe(
        map((items): Listing<T> => ({ state: 'ok', items })),
        catchError(() => of<Listing<T>>({ state: 'failed' })),
        startWith<Listing<T>>({ state: 'loading' }),
      ),
    ),
  );
}

function itemsOf<T>(listing: Listing<T>): readonly T[] {
  return listing.state === 'ok' ? listing.items : [];
}
