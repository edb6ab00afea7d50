/**
 * Report figures as a small list of vector shapes in a W×H box, so the HTML report (SVG) and the
 * PDF (pdfkit paths) draw exactly the same picture.
 */
import { LOSS_NAMES } from '../calculators/limits';
import { formatQuantity } from '../hydraulics/units';
import type { UnitSystem } from '../hydraulics/units';

export type Shape =
  | { kind: 'line'; x1: number; y1: number; x2: number; y2: number; colour: string; width: number; dash?: boolean }
  | { kind: 'rect'; x: number; y: number; w: number; h: number; fill: string }
  | { kind: 'poly'; points: [number, number][]; colour: string; width: number }
  | { kind: 'text'; x: number; y: number; text: string; size: number; colour: string; anchor?: 'start' | 'end' };

export interface Figure {
  title: string;
  w: number;
  h: number;
  shapes: Shape[];
}

export const FIG_W = 340;
export const FIG_H = 200;
const INK = '#14212b';
const SOFT = '#5b6b77';
const WASH = '#d9efef';

/** Elevation sketch of a line or siphon: source surface, crest, outlet (heights to scale, labels in `system`). */
export function schematicFigure(title: string, sourceM: number, outletM: number, crestM: number | null, accent: string, system: UnitSystem): Figure {
  const levels = [sourceM, outletM, ...(crestM !== null ? [crestM] : [])];
  const top = Math.max(...levels);
  const bot = Math.min(...levels, sourceM - 0.5);
  const span = Math.max(top - bot, 0.1);
  const y = (z: number): number => 20 + ((top - z) / span) * (FIG_H - 50);
  const ys = y(sourceM);
  const yo = y(outletM);
  const pipe: [number, number][] = crestM !== null
    ? [[60, ys + 20], [60, y(crestM)], [150, y(crestM)], [290, yo]]
    : [[60, ys + 20], [110, ys + 20], [290, yo]];
  const shapes: Shape[] = [
    { kind: 'rect', x: 10, y: ys, w: 100, h: 40, fill: WASH },
    { kind: 'line', x1: 10, y1: ys, x2: 110, y2: ys, colour: accent, width: 2 },
    { kind: 'text', x: 12, y: ys - 4, text: 'water surface', size: 9, colour: INK },
    { kind: 'poly', points: pipe, colour: accent, width: 3 },
    { kind: 'text', x: 286, y: yo + 14, text: `outlet ${formatQuantity('length', sourceM - outletM, system)} below`, size: 9, colour: INK, anchor: 'end' },
  ];
  if (crestM !== null) {
    shapes.push({ kind: 'line', x1: 150, y1: y(crestM), x2: 150, y2: ys, colour: SOFT, width: 1, dash: true });
    shapes.push({ kind: 'text', x: 156, y: y(crestM) - 4, text: `crest ${formatQuantity('length', crestM - sourceM, system)} above`, size: 9, colour: INK });
  }
  return { title, w: FIG_W, h: FIG_H, shapes };
}

/** Horizontal bars of head lost in each part of the line, named and in units as the tools show them. */
export function lossFigure(losses: Record<string, number>, accent: string, system: UnitSystem): Figure {
  const entries = Object.entries(losses);
  const max = Math.max(...entries.map(([, v]) => v), 1e-9);
  const shapes: Shape[] = entries.flatMap(([name, v], i): Shape[] => {
    const y0 = 20 + i * 40;
    const w = (v / max) * 200;
    return [
      { kind: 'text', x: 10, y: y0 + 14, text: (LOSS_NAMES[name as keyof typeof LOSS_NAMES] ?? name).replace(/ \(.*\)$/, ''), size: 10, colour: INK },
      { kind: 'rect', x: 80, y: y0, w: Math.max(w, 1), h: 20, fill: accent },
      { kind: 'text', x: 86 + w, y: y0 + 14, text: formatQuantity('length', v, system), size: 9, colour: INK },
    ];
  });
  return { title: 'Head lost in each part of the line', w: FIG_W, h: FIG_H, shapes };
}

/** Water depth against time while draining; every axis value with its unit, in `system`. */
export function drawdownFigure(curve: { time_s: number; depth_m: number }[], accent: string, system: UnitSystem): Figure {
  const tMax = Math.max(...curve.map((p) => p.time_s), 1e-9);
  const dMax = Math.max(...curve.map((p) => p.depth_m), 1e-9);
  const x = (t: number): number => 40 + (t / tMax) * 280;
  const y = (d: number): number => 170 - (d / dMax) * 150;
  return {
    title: 'Water depth while draining',
    w: FIG_W,
    h: FIG_H,
    shapes: [
      { kind: 'line', x1: 40, y1: 20, x2: 40, y2: 170, colour: INK, width: 1 },
      { kind: 'line', x1: 40, y1: 170, x2: 320, y2: 170, colour: INK, width: 1 },
      { kind: 'text', x: 36, y: 24, text: formatQuantity('length', dMax, system), size: 8, colour: SOFT, anchor: 'end' },
      { kind: 'text', x: 320, y: 184, text: formatQuantity('time', tMax, system), size: 8, colour: SOFT, anchor: 'end' },
      { kind: 'text', x: 44, y: 184, text: formatQuantity('time', 0, system), size: 8, colour: SOFT },
      { kind: 'text', x: 36, y: 170, text: formatQuantity('length', 0, system), size: 8, colour: SOFT, anchor: 'end' },
      { kind: 'poly', points: curve.map((p) => [x(p.time_s), y(p.depth_m)]), colour: accent, width: 2 },
    ],
  };
}

const escXml = (s: string): string => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The figure as an inline SVG element. */
export function figureSvg(f: Figure): string {
  const body = f.shapes
    .map((s) => {
      switch (s.kind) {
        case 'line':
          return `<line x1="${s.x1}" y1="${s.y1}" x2="${s.x2}" y2="${s.y2}" stroke="${s.colour}" stroke-width="${s.width}"${s.dash ? ' stroke-dasharray="3 2"' : ''}/>`;
        case 'rect':
          return `<rect x="${s.x}" y="${s.y}" width="${s.w}" height="${s.h}" fill="${s.fill}"/>`;
        case 'poly':
          return `<polyline fill="none" stroke="${s.colour}" stroke-width="${s.width}" stroke-linejoin="round" points="${s.points.map((p) => p.map((n) => n.toFixed(1)).join(',')).join(' ')}"/>`;
        case 'text':
          return `<text x="${s.x}" y="${s.y}" font-size="${s.size}" fill="${s.colour}"${s.anchor === 'end' ? ' text-anchor="end"' : ''}>${escXml(s.text)}</text>`;
      }
    })
    .join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${f.w} ${f.h}" role="img" aria-label="${escXml(f.title)}"><title>${escXml(f.title)}</title>${body}</svg>`;
}
