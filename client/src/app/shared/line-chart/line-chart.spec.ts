import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Chart } from 'chart.js';

import { PREFERS_DARK_QUERY, THEME_STORAGE } from '../../core/theme';
import { LineChart } from './line-chart';
import { ChartMarker, ChartRange, ChartSeries } from './line-chart-data';

@Component({
  imports: [LineChart],
  template: `<kx-line-chart [series]="series()" yLabel="Cp° / (J/(mol·K))" [validRange]="range()" [markers]="markers()" description="Heat capacity of water" />`,
})
class LineChartHost {
  readonly series = signal<ChartSeries[]>([{ label: 'Cp°', points: [{ x: 300, y: 33.6 }, { x: 1000, y: 41.3 }, { x: 2000, y: 51.2 }] }]);
  readonly range = signal<ChartRange | null>({ min: 300, max: 2000, label: 'fit valid 300–2000 K' });
  readonly markers = signal<ChartMarker[]>([]);
}

describe('LineChart', () => {
  let fixture: ComponentFixture<LineChartHost>;
  let host: HTMLElement;

  async function rendered(): Promise<Chart> {
    for (let attempt = 0; attempt < 100; attempt++) {
      await fixture.whenStable();
      const canvas = host.querySelector('canvas')!;
      const chart = Chart.getChart(canvas);
      if (host.querySelector('kx-line-chart')!.getAttribute('data-chart-state') === 'ready' && chart) {
        return chart;
      }
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    throw new Error('the chart was never drawn');
  }

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [
        { provide: THEME_STORAGE, useValue: null },
        { provide: PREFERS_DARK_QUERY, useValue: null },
      ],
    });
    fixture = TestBed.createComponent(LineChartHost);
    host = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  afterEach(() => document.documentElement.classList.remove('kx-theme-light', 'kx-theme-dark'));

  it('loads Chart.js on demand and draws the series on a labelled canvas', async () => {
    const chart = await rendered();
    expect(host.querySelector('canvas')!.getAttribute('role')).toBe('img');
    expect(host.querySelector('canvas')!.getAttribute('aria-label')).toBe('Heat capacity of water');
    expect(chart.data.datasets[0].data.length).toBe(3);
    expect((chart.options.scales!['y'] as { title: { text: string } }).title.text).toBe('Cp° / (J/(mol·K))');
  });

  it('widens the axis around the valid range so its edges show', async () => {
    const chart = await rendered();
    expect(chart.options.scales!['x']!.min).toBe(215);
    expect(chart.options.scales!['x']!.max).toBe(2085);
  });

  it('draws again with the new data when the inputs change', async () => {
    const first = await rendered();
    fixture.componentInstance.series.set([{ label: 'Cp°', points: [{ x: 300, y: 1 }, { x: 400, y: 2 }] }]);
    fixture.componentInstance.markers.set([{ x: 350, label: 'ΔrG° = 0 at 350 K' }]);
    await fixture.whenStable();
    const second = await rendered();
    expect(second).not.toBe(first);
    expect(second.data.datasets[0].data.length).toBe(2);
  });
});
