import { ChangeDetectionStrategy, Component, input, model } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';

import { MOLAR_ENERGY_UNITS, MolarEnergyUnit } from './molar-energy-unit';

/** Chooses the unit molar energies are shown in: `<kx-unit-selector [(unit)]="unit" />`. */
@Component({
  selector: 'kx-unit-selector',
  imports: [MatButtonToggleModule],
  templateUrl: './unit-selector.html',
  styleUrl: './unit-selector.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UnitSelector {
  readonly unit = model<MolarEnergyUnit>('kJ/mol');
  readonly label = input('Energy unit');

  protected readonly units = MOLAR_ENERGY_UNITS;

  protected selectUnit(unit: MolarEnergyUnit): void {
    this.unit.set(unit);
  }
}
