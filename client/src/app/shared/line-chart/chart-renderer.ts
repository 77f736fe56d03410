// Loaded only through a dynamic import (see line-chart.ts), so Chart.js stays out of the
// initial bundle and out of every page that shows no plot. Import only what a line chart needs,
// so the lazy chunk holds no other chart types.
import { Chart, Legend, LineController, LineElement, LinearScale, PointElement, Tooltip, type Plugin } from 'chart.js';

import type { ChartMarker, ChartRange, LineChartConfig } from './line-chart-data';

Chart.register(LineController, LineElement, PointElement, LinearScale, Tooltip, Legend);

export type LineChart = Chart<'line', { x: number; y: number | null }[]>;

/** Margin added on each side of a valid range, as a fraction of its width, so its edges show. */
const RANGE_MARGIN = 0.05;

/** Draws a line chart on `canvas`; the caller destroys the returned chart before drawing again. */
export function drawLineChart(canvas: HTMLCanvasElement, config: LineChartConfig): LineChart {
  const { colors } = config;
  const range = config.validRange;
  const span = range ? range.max - range.min : 0;
  const font = { family: config.font, size: 12 };
  return new Chart(canvas, {
    type: 'line',
    data: {
      datasets: config.series.map((series, index) => ({
        label: series.label,
        data: series.points.map((point) => ({ x: point.x, y: point.y })),
        borderColor: colors.series[index % colors.series.length],
        backgroundColor: colors.series[index % colors.series.length],
        borderWidth: 2,
        pointRadius: series.points.length > 40 ? 0 : 2,
        pointHoverRadius: 4,
        tension: 0,
        spanGaps: false,
      })),
    },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      parsing: false,
      normalized: true,
      interaction: { mode: 'nearest', axis: 'x', intersect: false },
      scales: {
        x: {
          type: 'linear',
          min: range && span > 0 ? Math.max(0, range.min - RANGE_MARGIN * span) : undefined,
          max: range && span > 0 ? range.max + RANGE_MARGIN * span : undefined,
          title: { display: true, text: config.xLabel, color: colors.text, font },
          // Round tick values only: the widened ends of a valid range are not round numbers.
          ticks: { color: colors.text, font, includeBounds: false },
          grid: { color: colors.grid },
        },
        y: {
          type: 'linear',
          title: { display: true, text: config.yLabel, color: colors.text, font },
          ticks: { color: colors.text, font },
          grid: { color: colors.grid },
        },
      },
      plugins: {
        legend: { display: config.series.length > 1, labels: { color: colors.text, font } },
        tooltip: { enabled: true },
      },
    },
    plugins: [annotations(range, config.markers, config)],
  });
}

/** Shades x outside the valid range and draws the markers: small enough not to need a package. */
function annotations(range: ChartRange | null, markers: readonly ChartMarker[], config: LineChartConfig): Plugin<'line'> {
  const { colors } = config;
  return {
    id: 'kxAnnotations',
    beforeDatasetsDraw(chart) {
      if (!range) {
        return;
      }
      const { ctx, chartArea: area, scales } = chart;
      const left = clamp(scales['x'].getPixelForValue(range.min), area.left, area.right);
      const right = clamp(scales['x'].getPixelForValue(range.max), area.left, area.right);
      ctx.save();
      ctx.fillStyle = colors.outside;
      ctx.fillRect(area.left, area.top, left - area.left, area.bottom - area.top);
      ctx.fillRect(right, area.top, area.right - right, area.bottom - area.top);
      ctx.strokeStyle = colors.text;
      ctx.setLineDash([4, 4]);
      ctx.lineWidth = 1;
      for (const x of [left, right]) {
        ctx.beginPath();
        ctx.moveTo(x, area.top);
        ctx.lineTo(x, area.bottom);
        ctx.stroke();
      }
      ctx.setLineDash([]);
      ctx.fillStyle = colors.text;
      ctx.font = `12px ${config.font}`;
      ctx.textAlign = 'center';
      ctx.textBaseline = 'top';
      ctx.fillText(range.label, (left + right) / 2, area.top + 4);
      ctx.restore();
    },
    afterDatasetsDraw(chart) {
      const { ctx, chartArea: area, scales } = chart;
      ctx.save();
      for (const marker of markers) {
        const x = scales['x'].getPixelForValue(marker.x);
        if (x < area.left || x > area.right) {
          continue;
        }
        ctx.strokeStyle = colors.marker;
        ctx.lineWidth = 2;
        ctx.beginPath();
        ctx.moveTo(x, area.top);
        ctx.lineTo(x, area.bottom);
        ctx.stroke();
        ctx.fillStyle = colors.marker;
        ctx.font = `600 12px ${config.font}`;
        ctx.textBaseline = 'top';
        const roomOnRight = area.right - x > ctx.measureText(marker.label).width + 8;
        ctx.textAlign = roomOnRight ? 'left' : 'right';
        ctx.fillText(marker.label, x + (roomOnRight ? 4 : -4), area.top + 20);
      }
      ctx.restore();
    },
  };
}

function clamp(value: number, min: number, max: number): number {
  return Math.min(Math.max(value, min), max);
}
