import { CataloguePhase } from '../catalogue/catalogue-api';
import { fitPlotSeries } from './fit-plot';

describe('fitPlotSeries', () => {
  const source = { id: 's', key: 'janaf-1998', citation: 'JANAF', doi: null };
  const phase: CataloguePhase = {
    phase: 'g',
    polymorph: null,
    quantities: [
      {
        quantity: 'Cp',
        symbol: 'Cp°',
        unit: 'J/(mol·K)',
        transitionKind: null,
        recommended: {
          id: 'v1', lineageId: 'l1', versionNo: 1, value: 29.1, uncertainty: null, uncertaintyKind: null, coverageFactor: null,
          unit: 'J/(mol·K)', temperature: 298.15, pressure: 100000, method: 'evaluated', methodDetail: null, source,
        },
        alternatives: [],
      },
    ],
    fits: [{ id: 'f1', form: 'constant', tMin: 300, tMax: 1000, ranges: [{ tMin: 300, tMax: 1000, coefficients: [30] }], source, recommended: true }],
  };

  it('plots the fit being entered against the catalogue’s fits and Cp° values', () => {
    const series = fitPlotSeries('constant', [{ tMin: 298.15, tMax: 1500, coefficients: [29.5] }], phase);
    expect(series.map((s) => s.label)).toEqual(['This fit', 'constant fit, janaf-1998 (recommended)', 'Cp° at 298.15 K, janaf-1998']);
    expect(series[0].points[0]).toEqual({ x: 298.15, y: 29.5 });
    expect(series[2].points).toEqual([{ x: 298.15, y: 29.1 }]);
  });

  it('plots nothing for the entered fit until a range reads', () => {
    expect(fitPlotSeries('shomate', [], null)).toEqual([]);
  });
});
