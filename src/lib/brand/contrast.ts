/**
 * WCAG 2.x contrast between two sRGB colours: relative luminance
 * L = 0.2126 R + 0.7152 G + 0.0722 B on linearised channels, ratio (L1 + 0.05) / (L2 + 0.05).
 * Source: WCAG 2.1, definitions of "relative luminance" and "contrast ratio".
 */

const HEX = /^#[0-9a-f]{6}$/i;

export function isHexColour(v: string): boolean {
  return HEX.test(v);
}

function channel(c8: number): number {
  const c = c8 / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

/** Relative luminance of #rrggbb, 0 (black) to 1 (white). */
export function luminance(hex: string): number {
  const n = Number.parseInt(hex.slice(1), 16);
  return 0.2126 * channel((n >> 16) & 255) + 0.7152 * channel((n >> 8) & 255) + 0.0722 * channel(n & 255);
}

/** Contrast ratio of two colours, 1 to 21. */
export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** WCAG AA asks 4.5:1 for body text and 3:1 for large text and graphics. */
export const AA_TEXT = 4.5;
/**
 * The least a brand colour may have on white: WCAG 2.1 SC 1.4.3 (large text, as the report's
 * headings are) and SC 1.4.11 (graphics, as its figures and rules are) both ask 3:1.
 */
export const MIN_ON_PAPER = 3;

export interface ContrastVerdict {
  ratio: number;
  /** Against white paper, as text is printed on the report. */
  textOnPaper: 'aa' | 'large_only' | 'fails';
}

export function checkOnWhite(hex: string): ContrastVerdict {
  const ratio = contrastRatio(hex, '#ffffff');
  return { ratio, textOnPaper: ratio >= AA_TEXT ? 'aa' : ratio >= MIN_ON_PAPER ? 'large_only' : 'fails' };
}
