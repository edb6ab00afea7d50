import type { ReactElement } from 'react';
import type { LossPart } from '../lib/calculators/limits';
import { LOSS_NAMES } from '../lib/calculators/limits';
import type { LossBreakdown, UnitSystem } from '../lib/hydraulics';
import { formatQuantity } from '../lib/hydraulics';

/** The loss breakdown as a table: head lost in each part and its share. */
export default function LossTable({
  losses,
  system,
}: {
  losses: LossBreakdown;
  system: UnitSystem;
}): ReactElement {
  const parts = Object.keys(LOSS_NAMES) as LossPart[];
  const total = parts.reduce((s, k) => s + losses[k], 0);
  return (
    // keyed by units: a unit switch builds a new table, cheaper than rewriting each cell in place
    <table key={system} className="w-full text-left tabular-nums" data-testid="loss-table">
      <caption className="text-left font-extrabold">Where the head goes</caption>
      <thead>
        <tr className="border-b border-rule">
          <th scope="col" className="py-1">
            Part
          </th>
          <th scope="col" className="py-1 text-right whitespace-nowrap">
            Head lost
          </th>
          <th scope="col" className="py-1 text-right">
            Share
          </th>
        </tr>
      </thead>
      <tbody>
        {parts.map((k) => (
          <tr key={k} className="border-b border-rule/60" data-loss={k}>
            <th scope="row" className="py-1 font-normal">
              {LOSS_NAMES[k]}
            </th>
            <td className="py-1 text-right">{formatQuantity('length', losses[k], system)}</td>
            <td className="py-1 text-right">
              {total > 0 ? `${Math.round((losses[k] / total) * 100)} %` : '—'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
