import { FormControl, FormGroup } from '@angular/forms';

import { niceStep, temperatureList, temperatureRangeRules } from './temperature-list';

describe('temperatureList', () => {
  it('starts at the reference temperature, then round temperatures, then the end', () => {
    expect(temperatureList(298.15, 1000, 100)).toEqual([298.15, 400, 500, 600, 700, 800, 900, 1000]);
  });

  it('skips a multiple that would crowd an end', () => {
    expect(temperatureList(300, 1020, 100)).toEqual([300, 400, 500, 600, 700, 800, 900, 1020]);
  });

  it('gives one temperature for an empty range', () => {
    expect(temperatureList(298.15, 298.15, 100)).toEqual([298.15]);
  });

  it('keeps floating-point noise out', () => {
    expect(temperatureList(0.1, 0.5, 0.1)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5]);
  });
});

describe('niceStep', () => {
  it('picks a round step for about the asked number of points', () => {
    expect(niceStep(5800, 80)).toBe(100);
    expect(niceStep(700, 80)).toBe(10);
    expect(niceStep(1000, 40)).toBe(25);
  });
});

describe('temperatureRangeRules', () => {
  const rules = (tMin: number, tMax: number, tStep: number) => temperatureRangeRules(new FormGroup({
    tMin: new FormControl(tMin), tMax: new FormControl(tMax), tStep: new FormControl(tStep),
  }));

  it('accepts a forward range of at most 200 temperatures', () => {
    expect(rules(298.15, 1500, 100)).toBeNull();
  });

  it('refuses a backward range and one with too many temperatures', () => {
    expect(rules(1000, 500, 100)?.['range']).toContain('must not be below');
    expect(rules(300, 6000, 1)?.['range']).toContain('more than 200 temperatures');
  });
});
