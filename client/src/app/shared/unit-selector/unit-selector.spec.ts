import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';

import { MolarEnergyUnit } from './molar-energy-unit';
import { UnitSelector } from './unit-selector';

@Component({
  imports: [UnitSelector],
  template: `<kx-unit-selector [(unit)]="unit" />`,
})
class UnitSelectorHost {
  readonly unit = signal<MolarEnergyUnit>('kJ/mol');
}

describe('UnitSelector', () => {
  let fixture: ComponentFixture<UnitSelectorHost>;

  function toggleButtons(): HTMLButtonElement[] {
    return Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('button'));
  }

  beforeEach(async () => {
    fixture = TestBed.createComponent(UnitSelectorHost);
    await fixture.whenStable();
  });

  it('offers kJ/mol and kcal/mol, with the bound unit checked', () => {
    expect(toggleButtons().map((button) => button.textContent!.trim())).toEqual(['kJ/mol', 'kcal/mol']);
    expect(toggleButtons().map((button) => button.getAttribute('aria-checked'))).toEqual(['true', 'false']);
  });

  it('names the group for screen readers', () => {
    const group = (fixture.nativeElement as HTMLElement).querySelector('mat-button-toggle-group')!;
    expect(group.getAttribute('aria-label')).toBe('Energy unit');
  });

  it('writes the chosen unit back through the two-way binding', async () => {
    toggleButtons()[1].click();
    await fixture.whenStable();
    expect(fixture.componentInstance.unit()).toBe('kcal/mol');
    expect(toggleButtons()[1].getAttribute('aria-checked')).toBe('true');
  });

  it('follows a unit set from outside', async () => {
    fixture.componentInstance.unit.set('kcal/mol');
    await fixture.whenStable();
    expect(toggleButtons().map((button) => button.getAttribute('aria-checked'))).toEqual(['false', 'true']);
  });
});
