import { BarElement, CategoryScale, Chart as ChartJS, LinearScale, Tooltip } from 'chart.js';
import { Bar } from 'react-chartjs-2';
import { seaFloor } from '../../app/theme';

// Only the parts a bar chart needs, so the rest of Chart.js stays out of the bundle.
ChartJS.register(BarElement, CategoryScale, LinearScale, Tooltip);
// The studio's typeface on the canvas too (it is loaded with the app, not from a CDN).
ChartJS.defaults.font.family = 'Lexend, system-ui, sans-serif';

const ROW_PX = 28;
const FRAME_PX = 48;

const reducedMotion = () => typeof matchMedia === 'function' && matchMedia('(prefers-reduced-motion: reduce)').matches;

/**
 * One figure as horizontal bars, largest first as the server orders them. The canvas is an image
 * named by `label`; the table beside it carries the same numbers for everyone who cannot see it.
 */
export function FigureChart({ label, labels, values, format, decimals }: { label: string; labels: string[]; values: number[]; format: (value: number) => string; decimals: number }) {
  return (
    <div style={{ position: 'relative', height: `${labels.length * ROW_PX + FRAME_PX}px` }}>
      <Bar
        role="img"
        aria-label={label}
        data={{ labels, datasets: [{ label, data: values, backgroundColor: seaFloor[80], hoverBackgroundColor: seaFloor[60], borderRadius: 3, maxBarThickness: 20 }] }}
        options={{
          indexAxis: 'y',
          responsive: true,
          maintainAspectRatio: false,
          animation: reducedMotion() ? false : undefined,
          plugins: { tooltip: { callbacks: { label: (item) => format(item.parsed.x ?? 0) } } },
          scales: { x: { beginAtZero: true, ticks: { precision: decimals, maxTicksLimit: 8, callback: (value) => format(Number(value)) } } },
        }}
      />
    </div>
  );
}
