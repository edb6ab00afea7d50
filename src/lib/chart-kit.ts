/**
 * chart.js set-up shared by the lazily loaded chart components (this module is only reached
 * through their dynamic imports, so it never joins a page's first load).
 */
import {
  BarElement,
  CategoryScale,
  Chart,
  Filler,
  Legend,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';

Chart.register(BarElement, CategoryScale, Filler, Legend, LinearScale, LineElement, PointElement, Tooltip);
Chart.defaults.font.family = "'Nunito Sans', ui-sans-serif, system-ui, sans-serif";
Chart.defaults.color = '#3d4f5c';

/** Theme colours (src/styles/global.css) for chart strokes. */
export const INK = '#14212b';
export const TEAL = '#0f7c80';
export const EDGE = '#b36b00';
export const FAILS = '#c0392b';
export const RUNS = '#0072b2';
