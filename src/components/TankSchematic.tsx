import type { ReactElement } from 'react';
import type { DrainToolState } from '../lib/calculators/drain-tool';
import { vesselDepth } from '../lib/calculators/drain-tool';
import type { UnitSystem } from '../lib/hydraulics';
import { formatQuantity } from '../lib/hydraulics';

const W = 340;
const H = 250;
const PAD = 24;

/** Width of the vessel's section at height h above its bottom, m (a table: √area). */
function widthAt(s: DrainToolState, h: number): number {
  const d = s.v_diameter_m;
  switch (s.shape) {
    case 'box':
      return s.v_length_m;
    case 'vertical_cylinder':
      return d;
    case 'horizontal_cylinder':
    case 'sphere':
      return 2 * Math.sqrt(Math.max(0, h * (d - h)));
    case 'cone_bottom':
      return h < s.v_cone_height_m ? (d * h) / s.v_cone_height_m : d;
    case 'sloped_pond':
      return s.v_bottom_length_m + 2 * s.v_slope * h;
    default: {
      const rows = s.stage;
      const i = rows.findIndex((r) => r.depth_m >= h);
      if (i <= 0) return Math.sqrt(rows[0]?.area_m2 ?? 0);
      const a = rows[i - 1]!;
      const b = rows[i]!;
      return Math.sqrt(a.area_m2 + ((b.area_m2 - a.area_m2) * (h - a.depth_m)) / (b.depth_m - a.depth_m));
    }
  }
}

/** The vessel's section to scale with the water, the target level and the outlet. */
export default function TankSchematic({ s, system }: { s: DrainToolState; system: UnitSystem }): ReactElement {
  const depth = Math.max(vesselDepth(s), 0.01);
  const hs = Array.from({ length: 41 }, (_, i) => (depth * i) / 40);
  const maxW = Math.max(...hs.map((h) => widthAt(s, h)), 0.01);
  const below = s.outlet === 'orifice' ? 0 : Math.max(0, s.bottom_m - s.outlet_m);
  const above = s.outlet === 'siphon' ? Math.max(0, s.crest_m - (s.bottom_m + depth)) : 0;
  const scale = Math.min((W * 0.55) / maxW, (H - 2 * PAD) / (depth + below + above));
  const cx = W * 0.35;
  const yOf = (elev: number): number => PAD + (s.bottom_m + depth + above - elev) * scale;
  const y = (h: number): number => yOf(s.bottom_m + h);
  const outline = (top: number): string => {
    const pts = hs.filter((h) => h <= top).concat(top);
    const right = pts.map((h) => `${cx + (widthAt(s, h) * scale) / 2},${y(h)}`);
    const left = pts.reverse().map((h) => `${cx - (widthAt(s, h) * scale) / 2},${y(h)}`);
    return [...right, ...left].join(' ');
  };
  const len = (m: number): string => formatQuantity('length', m, system);
  const h0 = Math.min(s.initial_depth_m, depth);
  const rimX = cx + (widthAt(s, depth) * scale) / 2;
  const intakeY = y(s.outlet === 'orifice' ? s.hole_height_m : s.intake_height_m);
  const pipe =
    s.outlet === 'line'
      ? `M ${cx} ${intakeY} L ${cx} ${y(0) + 6} L ${W - 30} ${yOf(s.outlet_m)}`
      : s.outlet === 'siphon'
        ? `M ${cx} ${intakeY} L ${cx} ${yOf(s.crest_m)} L ${rimX + 10} ${yOf(s.crest_m)} L ${W - 30} ${yOf(s.outlet_m)}`
        : '';
  return (
    <figure className="min-w-0 rounded-lg border border-rule bg-white p-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-labelledby="tank-schematic-title" data-testid="schematic">
        <title id="tank-schematic-title">{`Vessel section to scale: ${len(depth)} deep, water at ${len(h0)}, target ${len(s.final_depth_m)}`}</title>
        <polygon points={outline(h0)} className="fill-teal-wash" />
        <polygon points={outline(depth)} className="fill-none stroke-ink" strokeWidth="2" />
        <line x1={cx - (widthAt(s, h0) * scale) / 2} x2={cx + (widthAt(s, h0) * scale) / 2} y1={y(h0)} y2={y(h0)} className="stroke-teal" strokeWidth="2" />
        <line x1={cx - (maxW * scale) / 2} x2={cx + (maxW * scale) / 2} y1={y(s.final_depth_m)} y2={y(s.final_depth_m)} className="stroke-verdict-edge" strokeDasharray="5 3" />
        <text x={cx + (maxW * scale) / 2 + 4} y={y(h0) + 4} className="fill-ink text-[10px] font-bold" data-dim="depth">water {len(h0)}</text>
        <text x={cx + (maxW * scale) / 2 + 4} y={y(s.final_depth_m) + 12} className="fill-ink-soft text-[10px]">target {len(s.final_depth_m)}</text>
        {pipe && <path d={pipe} className="fill-none stroke-ink" strokeWidth="4" strokeLinejoin="round" />}
        {pipe && <circle cx={W - 30} cy={yOf(s.outlet_m)} r="4" className="fill-ink" />}
        {s.outlet === 'orifice' && <circle cx={cx} cy={intakeY} r="4" className="fill-ink" />}
        {s.outlet !== 'orifice' && <text x={W - 26} y={yOf(s.outlet_m) + 16} textAnchor="end" className="fill-ink text-[10px]">outlet {len(Math.abs(s.bottom_m - s.outlet_m))} {s.outlet_m <= s.bottom_m ? 'below' : 'above'} the bottom</text>}
      </svg>
      <figcaption className="text-step--1 text-ink-faint">Section drawn to scale{s.shape === 'stage_table' ? ' (width shown as √area)' : ''}.</figcaption>
    </figure>
  );
}
