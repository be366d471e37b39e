// Registers the chart.js parts our line charts use (imported only by the lazily loaded charts, so
// chart.js never weighs on the practice pages) and builds their shared options.
import {
  CategoryScale,
  Chart,
  Legend,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
  type ChartOptions,
} from 'chart.js'
import { chartInk } from './chart-palette'

Chart.register(CategoryScale, LinearScale, LineElement, PointElement, Tooltip, Legend)

/** Line chart options for the theme; `unit` follows each value in tooltips and the y axis. */
export function lineOptions(dark: boolean, unit: string, yMax?: number): ChartOptions<'line'> {
  const ink = chartInk(dark)
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    interaction: { mode: 'index', intersect: false },
    plugins: {
      legend: {
        position: 'bottom',
        labels: { color: ink.text, usePointStyle: true, boxWidth: 10, font: { size: 12 } },
      },
      tooltip: {
        callbacks: {
          label: (c) => (c.parsed.y === null ? '' : `${c.dataset.label}: ${c.parsed.y} ${unit}`),
        },
      },
    },
    scales: {
      x: {
        ticks: { color: ink.text, maxRotation: 0, autoSkipPadding: 12 },
        grid: { color: ink.grid },
      },
      y: {
        beginAtZero: true,
        ...(yMax ? { max: yMax } : {}),
        ticks: { color: ink.text, callback: (v) => `${v} ${unit}` },
        grid: { color: ink.grid },
      },
    },
  }
}
