import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';

import { describePhase } from '../shared/phase-badge/phase';
import { Quantity, quantityText } from '../shared/quantity/quantity';
import { MolarEnergyUnit } from '../shared/unit-selector/molar-energy-unit';
import { CiteDialog } from './cite-dialog';
import { CitedValue } from './citation';
import { PhaseQuantity, SpeciesDetail, SpeciesPhase, ThermoValue } from './species-record';
import { DisplayedValue, describeMethod, describePressure, describeUncertainty, displayValue } from './value-display';

interface ShownValue {
  readonly value: ThermoValue;
  readonly shown: DisplayedValue;
  /** Uncertainty meaning, temperature, pressure and method in one line. */
  readonly conditions: string;
  readonly people: string;
  readonly history: readonly { readonly id: string | number; readonly text: string; readonly createdAt: string; readonly releases: string }[];
}

interface QuantityEntry {
  readonly quantity: PhaseQuantity;
  readonly name: string;
  readonly recommended: ShownValue | null;
  readonly alternatives: readonly ShownValue[];
}

const QUANTITY_NAMES: Record<string, string> = {
  dfH: 'standard enthalpy of formation',
  S: 'standard molar entropy',
  Cp: 'standard molar heat capacity',
  dfG: 'standard Gibbs energy of formation',
  dtrsH: 'enthalpy of transition',
};

/**
 * A phase's values, one card per quantity: the recommended value with its uncertainty, conditions,
 * method and source; then the alternatives from other sources and the value's history.
 */
@Component({
  selector: 'kx-phase-values',
  imports: [DatePipe, MatButtonModule, MatExpansionModule, Quantity],
  templateUrl: './phase-values.html',
  styleUrl: './phase-values.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhaseValues {
  private readonly dialog = inject(MatDialog);

  readonly species = input.required<SpeciesDetail>();
  readonly phase = input.required<SpeciesPhase>();
  readonly unit = input.required<MolarEnergyUnit>();
  /** Address of this page pinned to its release, for citations. */
  readonly pageUrl = input.required<string>();

  protected readonly entries = computed<QuantityEntry[]>(() =>
    this.phase().quantities.map((quantity) => ({
      quantity,
      name: QUANTITY_NAMES[quantity.quantity] ?? '',
      recommended: quantity.recommended ? this.show(quantity.recommended) : null,
      alternatives: quantity.alternatives.map((value) => this.show(value)),
    })),
  );

  protected cite(quantity: PhaseQuantity, shown: ShownValue): void {
    const species = this.species();
    const phase = this.phase();
    const data: CitedValue = {
      speciesName: species.name,
      formula: species.formula,
      phase: describePhase(phase.phase, phase.polymorph).abbreviation,
      quantityCode: quantity.quantity,
      symbol: quantity.symbol,
      valueText: `${quantityText(shown.shown.value, shown.shown.uncertainty)} ${shown.shown.unit}`,
      uncertaintyNote: describeUncertainty(shown.value),
      temperature: shown.value.temperature,
      source: shown.value.source,
      release: species.release,
      valueId: shown.value.id,
      url: this.pageUrl(),
      accessed: new Date(),
    };
    this.dialog.open(CiteDialog, { data, width: '44rem', maxWidth: '95vw', autoFocus: 'first-heading' });
  }

  private show(value: ThermoValue): ShownValue {
    const unit = this.unit();
    const conditions = [
      describeUncertainty(value),
      value.temperature !== null ? `${value.temperature} K` : '',
      describePressure(value.pressure),
      describeMethod(value.method) + (value.methodDetail ? ` (${value.methodDetail})` : ''),
    ].filter(Boolean);
    const people = [value.enteredBy ? `entered by ${value.enteredBy}` : '', value.approvedBy ? `approved by ${value.approvedBy}` : '']
      .filter(Boolean)
      .join(', ');
    return {
      value,
      shown: displayValue(value, unit),
      conditions: conditions.join(' · '),
      people,
      history: value.history.map((version) => {
        const shown = displayValue({ value: version.value, uncertainty: version.uncertainty, unit: value.unit }, unit);
        return {
          id: version.id,
          text: `${quantityText(shown.value, shown.uncertainty)} ${shown.unit}`,
          createdAt: version.createdAt,
          releases: version.releases.length > 0 ? version.releases.join(', ') : 'not published',
        };
      }),
    };
  }
}
