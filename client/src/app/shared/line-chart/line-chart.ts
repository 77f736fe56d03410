import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  afterNextRender,
  effect,
  inject,
  input,
  signal,
  untracked,
  viewChild,
} from '@angular/core';

import { ThemeService } from '../../core/theme';
import type { LineChart as ChartInstance } from './chart-renderer';
import { ChartColors, ChartMarker, ChartRange, ChartSeries } from './line-chart-data';

type Renderer = typeof import('./chart-renderer');
type ChartState = 'loading' | 'ready' | 'failed';

/**
 * A line chart drawn with Chart.js, which is fetched the first time a chart is shown (a dynamic
 * import) rather than with the app. Shades the x range outside `validRange` and draws
 * `markers` as labelled vertical lines. The canvas is an image named by `description`; pages
 * show the same numbers in a table for readers who cannot see it.
 */
@Component({
  selector: 'kx-line-chart',
  template: `
    <div class="kx-chart-box">
      <canvas #canvas role="img" [attr.aria-label]="description()"></canvas>
    </div>
    @if (state() === 'failed') {
      <p class="kx-chart-failed">The plot could not be drawn; the table shows the same values.</p>
    }
  `,
  styles: `
    :host {
      display: block;
      min-width: 0;
    }
    .kx-chart-box {
      position: relative;
      height: var(--kx-chart-height, 260px);
    }
    .kx-chart-failed {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[attr.data-chart-state]': 'state()' },
})
export class LineChart {
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly theme = inject(ThemeService);
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('canvas');
  private readonly renderer = signal<Renderer | null>(null);
  private chart: ChartInstance | null = null;

  readonly series = input.required<readonly ChartSeries[]>();
  readonly description = input.required<string>();
  readonly xLabel = input('T / K');
  readonly yLabel = input('');
  readonly validRange = input<ChartRange | null>(null);
  readonly markers = input<readonly ChartMarker[]>([]);

  protected readonly state = signal<ChartState>('loading');

  constructor() {
    afterNextRender(() => {
      import('./chart-renderer')
        .then((renderer) => this.renderer.set(renderer))
        .catch((error: unknown) => {
          console.error(error);
          this.state.set('failed');
        });
    });

    effect(() => {
      const renderer = this.renderer();
      const config = {
        series: this.series(),
        xLabel: this.xLabel(),
        yLabel: this.yLabel(),
        validRange: this.validRange(),
        markers: this.markers(),
        scheme: this.theme.scheme(),
      };
      if (renderer === null) {
        return;
      }
      untracked(() => {
        this.chart?.destroy();
        this.chart = renderer.drawLineChart(this.canvas().nativeElement, {
          ...config,
          colors: this.resolveColors(),
          font: getComputedStyle(this.host.nativeElement).fontFamily,
        });
        this.state.set('ready');
      });
    });

    inject(DestroyRef).onDestroy(() => this.chart?.destroy());
  }

  /** Reads the theme's colours as rgb() strings: light-dark() values resolve only on a real property. */
  private resolveColors(): ChartColors {
    const probe = document.createElement('span');
    probe.style.display = 'none';
    this.host.nativeElement.appendChild(probe);
    const resolve = (cssColor: string): string => {
      probe.style.color = cssColor;
      return getComputedStyle(probe).color;
    };
    const colors: ChartColors = {
      series: [resolve('var(--mat-sys-primary)'), resolve('var(--mat-sys-tertiary)'), resolve('var(--mat-sys-secondary)')],
      text: resolve('var(--mat-sys-on-surface-variant)'),
      grid: resolve('color-mix(in srgb, var(--mat-sys-outline-variant) 60%, transparent)'),
      outside: resolve('color-mix(in srgb, var(--mat-sys-outline) 16%, transparent)'),
      marker: resolve('var(--mat-sys-error)'),
    };
    probe.remove();
    return colors;
  }
}
