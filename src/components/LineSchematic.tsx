import type { ReactElement } from 'react';
import type { UnitSystem } from '../lib/hydraulics';
import { formatQuantity } from '../lib/hydraulics';

interface Props {
  sourceLevelM: number;
  outletM: number;
  /** Siphon crest elevation; none for a gravity line. */
  crestM?: number;
  tailwaterM?: number;
  system: UnitSystem;
}

const W = 340;
const H = 230;
const TOP = 24;
const BOTTOM = 206;

/**
 * The set-up in elevation, heights drawn to scale (one scale for every level; the horizontal is
 * not to scale): source and its surface, crest, outlet, tailwater, with the heights labelled.
 */
export default function LineSchematic({ sourceLevelM, outletM, crestM, tailwaterM, system }: Props): ReactElement {
  const levels = [sourceLevelM, outletM, ...(crestM !== undefined ? [crestM] : []), ...(tailwaterM !== undefined ? [tailwaterM] : [])];
  const span = Math.max(Math.max(...levels) - Math.min(...levels), 0.1);
  const zTop = Math.max(...levels) + span * 0.08;
  const zBot = Math.min(...levels, sourceLevelM - span * 0.35) - span * 0.05;
  const y = (z: number): number => TOP + ((zTop - z) / (zTop - zBot)) * (BOTTOM - TOP);
  const len = (m: number): string => formatQuantity('length', Math.abs(m), system);
  const ys = y(sourceLevelM);
  const basinBottom = y(sourceLevelM - span * 0.3);
  const intakeY = (ys + basinBottom) / 2;
  const crestX = 150;
  const outX = 290;
  const yOut = y(outletM);
  const path =
    crestM !== undefined
      ? `M 80 ${intakeY} L 80 ${y(crestM) + 8} Q 80 ${y(crestM)} 92 ${y(crestM)} L ${crestX} ${y(crestM)} L ${outX} ${yOut}`
      : `M 80 ${intakeY} L 120 ${intakeY} L ${outX} ${yOut}`;
  const scaleM = niceStep(span);
  return (
    <figure className="min-w-0 rounded-lg border border-rule bg-white p-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-labelledby="line-schematic-title" data-testid="schematic">
        <title id="line-schematic-title">
          {`Set-up drawn to scale in height: source surface at ${len(sourceLevelM)}, ${crestM !== undefined ? `crest ${len(crestM - sourceLevelM)} above it, ` : ''}outlet ${len(sourceLevelM - outletM)} below it`}
        </title>
        <rect x="10" y={ys} width="100" height={basinBottom - ys} className="fill-teal-wash" />
        <path d={`M 10 ${ys - 10} L 10 ${basinBottom} L 110 ${basinBottom} L 110 ${ys - 10}`} className="fill-none stroke-ink" strokeWidth="2" />
        <line x1="10" x2="110" y1={ys} y2={ys} className="stroke-teal" strokeWidth="2" />
        <text x="14" y={ys - 4} className="fill-ink text-[10px]">water surface</text>
        {tailwaterM !== undefined && (
          <rect x={outX - 30} y={y(tailwaterM)} width="50" height={Math.max(BOTTOM - y(tailwaterM), 2)} className="fill-teal-wash stroke-teal" />
        )}
        <path d={path} className="fill-none stroke-ink" strokeWidth="5" strokeLinecap="round" strokeLinejoin="round" />
        <path d={path} className="fill-none stroke-teal" strokeWidth="2.5" strokeLinecap="round" strokeLinejoin="round" />
        <circle cx={outX} cy={yOut} r="4" className="fill-ink" />
        <text x={outX - 8} y={yOut + 4} textAnchor="end" className="fill-ink text-[10px]">outlet</text>
        {crestM !== undefined && (
          <g>
            <line x1="60" x2="60" y1={y(crestM)} y2={ys} className="stroke-ink-soft" strokeDasharray="3 2" />
            <line x1="56" x2="80" y1={y(crestM)} y2={y(crestM)} className="stroke-ink-soft" strokeDasharray="3 2" />
            <text x="92" y={y(crestM) - 7} className="fill-ink text-[11px] font-bold" data-dim="crest">
              crest {len(crestM - sourceLevelM)} {crestM >= sourceLevelM ? 'above' : 'below'}
            </text>
          </g>
        )}
        <line x1="316" x2="316" y1={ys} y2={yOut} className="stroke-ink-soft" strokeDasharray="3 2" />
        <line x1="300" x2="330" y1={ys} y2={ys} className="stroke-ink-soft" strokeDasharray="3 2" />
        <text x="312" y={(ys + yOut) / 2} textAnchor="end" className="fill-ink text-[11px] font-bold" data-dim="fall">
          {len(sourceLevelM - outletM)} {outletM <= sourceLevelM ? 'fall' : 'rise'}
        </text>
        <line x1="330" x2="330" y1={BOTTOM} y2={y(zBot + scaleM)} className="stroke-ink" strokeWidth="3" />
        <text x="336" y={BOTTOM + 16} textAnchor="end" className="fill-ink-soft text-[9px]">scale bar {len(scaleM)}</text>
      </svg>
      <figcaption className="text-step--1 text-ink-faint">Heights to scale; hose lengths are not.</figcaption>
    </figure>
  );
}

/** A round scale-bar length near a quarter of the span (1, 2 or 5 × 10ⁿ m). */
function niceStep(span: number): number {
  const raw = span / 4;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m < 1.5 ? 1 : m < 3.5 ? 2 : 5) * p;
}
