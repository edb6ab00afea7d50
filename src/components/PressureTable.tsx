import type { ReactElement } from 'react';
import type { ProfilePoint } from '../lib/calculators/siphon-profile';
import type { UnitSystem } from '../lib/hydraulics';
import { formatQuantity } from '../lib/hydraulics';

interface Props {
  points: ProfilePoint[];
  vaporPa: number;
  limitPa: number;
  system: UnitSystem;
}

/** Pressure along the siphon, every few points, against the limit and vapour pressure. */
export default function PressureTable({ points, vaporPa, limitPa, system }: Props): ReactElement {
  const rows = points.filter((_, i) => i % 5 === 0 || i === points.length - 1);
  return (
    // keyed by units: a unit switch builds a new table, cheaper than rewriting each cell in place
    <table key={system} className="w-full text-left tabular-nums" data-testid="pressure-table">
      <caption className="text-left text-ink-soft">
        Working limit {formatQuantity('pressure', limitPa, system)}; vapour pressure{' '}
        {formatQuantity('pressure', vaporPa, system)}.
      </caption>
      <thead>
        <tr className="border-b border-rule">
          <th scope="col">Along the line</th>
          <th scope="col" className="text-right">
            Height
          </th>
          <th scope="col" className="text-right">
            Pressure
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((p, i) => (
          <tr
            key={i}
            className={`border-b border-rule/60 ${p.p_pa < Math.max(limitPa, vaporPa) ? 'font-bold text-verdict-fails' : ''}`}
          >
            <td>{formatQuantity('length', p.s_m, system)}</td>
            <td className="text-right">{formatQuantity('elevation', p.z_m, system)}</td>
            <td className="text-right">{formatQuantity('pressure', p.p_pa, system)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
