import { createHash } from 'node:crypto';

/**
 * The print-HTML report's stylesheet. It carries the organisation's brand colours, so it is built
 * per request; the page lists its hash in the Content-Security-Policy (Astro.csp.insertStyleHash),
 * which allows no other inline style. Colours are validated as #rrggbb by the brand schema.
 */
export function reportCss(
  colours: { primaryColour: string; accentColour: string },
  paper: 'A4' | 'LETTER',
): string {
  const primary = safeColour(colours.primaryColour);
  const accent = safeColour(colours.accentColour);
  const pageSize = paper === 'LETTER' ? 'letter' : 'A4';
  return `
      @page { size: ${pageSize}; margin: 16mm 14mm 18mm; }
      body { font-family: 'Nunito Sans', ui-sans-serif, system-ui, sans-serif; color: #14212b; margin: 0 auto; max-width: 190mm; padding: 12px; font-size: 11pt; }
      h1, h2, h3 { color: ${primary}; margin: .4em 0 .2em; }
      .bar { border-top: 4px solid ${accent}; }
      .logo { max-height: 60px; max-width: 200px; }
      .lines { white-space: pre-line; }
      table.calc { width: 100%; border-collapse: collapse; break-before: page; }
      table.calc > thead td { font-size: 8pt; color: #5b6b77; border-bottom: 1px solid #c9d1d6; padding-bottom: 2px; }
      dl { display: grid; grid-template-columns: minmax(0, 1fr) minmax(0, 1fr); gap: 2px 12px; margin: 0; }
      dt { color: #3d4f5c; } dd { margin: 0; font-weight: 600; overflow-wrap: anywhere; }
      svg { width: 100%; max-width: 120mm; height: auto; border: 1px solid #c9d1d6; }
      .tools { display: flex; gap: 8px; flex-wrap: wrap; margin-bottom: 12px; }
      .tools a { padding: 10px 14px; border: 1px solid ${primary}; border-radius: 6px; color: ${primary}; text-decoration: none; }
      footer.run { font-size: 8pt; color: #5b6b77; border-top: 1px solid #c9d1d6; margin-top: 16px; }
      @media print { .tools { display: none; } body { padding: 0; max-width: none; } }
    `;
}

/** A colour as stored, or ink when a row somehow holds anything but #rrggbb (it goes into CSS). */
function safeColour(value: string): string {
  return /^#[0-9a-fA-F]{6}$/.test(value) ? value : '#14212b';
}

/** The CSP source expression for an inline style element with exactly this text. */
export function styleHash(css: string): `sha256-${string}` {
  return `sha256-${createHash('sha256').update(css, 'utf8').digest('base64')}`;
}
