import type { ReactElement } from 'react';
import type { Warning } from '../lib/hydraulics';

/** The engine's warnings, in its plain words. */
export default function WarningList({ warnings }: { warnings: readonly Warning[] }): ReactElement | null {
  if (warnings.length === 0) return null;
  return (
    <ul className="space-y-2" aria-label="Warnings">
      {warnings.map((w) => (
        <li key={w.code} data-warning={w.code} className="rounded-lg border border-verdict-edge bg-white p-3">
          {w.message}
        </li>
      ))}
    </ul>
  );
}
