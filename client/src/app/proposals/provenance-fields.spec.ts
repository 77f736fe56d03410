import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component, signal, viewChild } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { ReactiveFormsModule } from '@angular/forms';
import { By } from '@angular/platform-browser';

import { SourceChoice, SourcePicker } from '../shared/sources/source-picker';
import { fitEntryForm } from './fit-entry-rules';
import { ProvenanceFields } from './provenance-fields';

@Component({
  imports: [ProvenanceFields, ReactiveFormsModule],
  template: `
    <form [formGroup]="form">
      <kx-provenance-fields entry="fit" [controls]="form.controls" [(source)]="source">
        <span class="kx-given">given field</span>
      </kx-provenance-fields>
    </form>
  `,
})
class ProvenanceHost {
  readonly form = fitEntryForm();
  readonly source = signal<SourceChoice | null>(null);
  readonly fields = viewChild.required(ProvenanceFields);
}

describe('ProvenanceFields', () => {
  let fixture: ComponentFixture<ProvenanceHost>;
  let backend: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;
  const errors = () => Array.from(element().querySelectorAll('mat-error')).map((e) => e.textContent!.trim());
  const labels = () => Array.from(element().querySelectorAll('mat-label')).map((l) => l.textContent!.trim());

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ProvenanceHost);
    await fixture.whenStable();
    // The source picker lists sources as soon as it shows.
    backend.match((r) => r.url === '/api/v1/sources').forEach((r) => r.flush({ items: [], total: 0 }));
  });

  it('groups the pressure and method under a legend, the given fields first, then the source fields', () => {
    const group = element().querySelector('fieldset')!;
    expect(group.querySelector('legend')!.textContent).toBe('Conditions and method');
    const row = group.querySelector('.kx-field-row')!;
    expect(row.firstElementChild!.classList).toContain('kx-given');
    expect(Array.from(row.querySelectorAll('mat-label')).map((l) => l.textContent!.trim())).toEqual(['Standard pressure p°', 'Method']);
    expect(labels()).toEqual(['Standard pressure p°', 'Method', 'Source', 'Where in the source (optional)', 'Notes (optional)']);
    expect(element().querySelector('mat-select')!.textContent).toContain('1 bar (100 000 Pa)');
  });

  it('shows the longer pressure whole', async () => {
    fixture.componentInstance.form.controls.pressurePa.setValue(101325);
    await fixture.whenStable();
    // The trigger cuts off what does not fit with an ellipsis.
    const shown = element().querySelector<HTMLElement>('.mat-mdc-select-value')!;
    expect(shown.textContent!.trim()).toBe('1 atm (101 325 Pa)');
    expect(shown.clientWidth).toBeGreaterThan(0);
    expect(shown.scrollWidth).toBeLessThanOrEqual(shown.clientWidth);
  });

  it('names each field by its label', () => {
    for (const control of Array.from(element().querySelectorAll<HTMLElement>('mat-select, input'))) {
      const labelledBy = control.getAttribute('aria-labelledby') ?? '';
      const labelled = control.id && element().querySelector(`label[for="${control.id}"]`);
      expect(labelledBy !== '' || !!labelled).withContext(control.outerHTML).toBeTrue();
    }
  });

  it('asks for the method, naming what is entered, once the form is touched', async () => {
    expect(errors()).toEqual([]);
    fixture.componentInstance.form.markAllAsTouched();
    await fixture.whenStable();
    expect(errors()).toEqual(['Say how the fit was obtained.']);
    const method = element().querySelectorAll('mat-select')[1];
    const error = element().querySelector('mat-error')!;
    expect(method.getAttribute('aria-describedby')).toContain(error.id);
  });

  it('asks for the level of theory of a computed entry only', async () => {
    const form = fixture.componentInstance.form;
    form.controls.method.setValue('computed');
    form.controls.levelOfTheory.updateValueAndValidity();
    await fixture.whenStable();
    expect(labels()).toContain('Level of theory');
    expect(element().querySelector<HTMLInputElement>('input[placeholder="G4"]')).not.toBeNull();
    form.markAllAsTouched();
    await fixture.whenStable();
    expect(errors()).toEqual(['A computed fit needs its level of theory (e.g. G4, CCSD(T)/CBS).']);

    form.controls.method.setValue('measured');
    await fixture.whenStable();
    expect(labels()).not.toContain('Level of theory');
  });

  it('says how long the source locator may be', async () => {
    const locator = fixture.componentInstance.form.controls.sourceLocator;
    locator.setValue('x'.repeat(501));
    locator.markAsTouched();
    await fixture.whenStable();
    expect(errors()).toEqual(['At most 500 characters.']);
  });

  it('edits the controls it is given', async () => {
    const input = element().querySelector<HTMLInputElement>('input[placeholder="Table 3, p. 14"]')!;
    input.value = 'Table 2';
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(fixture.componentInstance.form.controls.sourceLocator.value).toBe('Table 2');
  });

  it('asks for a source when touched without one, and passes the chosen source both ways', async () => {
    fixture.componentInstance.fields().touch();
    await fixture.whenStable();
    expect(errors().some((e) => e.startsWith('Choose a source from the list'))).toBeTrue();

    const picker = fixture.debugElement.query(By.directive(SourcePicker)).componentInstance as SourcePicker;
    const chosen: SourceChoice = { id: 's1', shortKey: 'okafor-2027', title: 'TC-04' };
    picker.source.set(chosen);
    await fixture.whenStable();
    expect(fixture.componentInstance.source()).toEqual(chosen);

    const other: SourceChoice = { id: 's2', shortKey: 'qpc-tc03-2025', title: 'TC-03' };
    fixture.componentInstance.source.set(other);
    await fixture.whenStable();
    expect(picker.source()).toEqual(other);
    expect(element().querySelector<HTMLInputElement>('.kx-source-input')!.value).toBe('qpc-tc03-2025 — TC-03');
  });
});
