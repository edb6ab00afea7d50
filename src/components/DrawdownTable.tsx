import type { ReactElement } from 'react';
import type { DrainCurvePoint, UnitSystem } from '../lib/hydraulics';
import { formatQuantity } from '../lib/hydraulics';

/** The drawdown curve as a table, every tenth row and the last. */
export default function DrawdownTable({
  curve,
  system,
}: {
  curve: DrainCurvePoint[];
  system: UnitSystem;
}): ReactElement {
  const rows = curve.filter((_, i) => i % 10 === 0 || i === curve.length - 1);
  return (
    // keyed by units: a unit switch builds a new table, cheaper than rewriting each cell in place
    <table key={system} className="w-full text-left tabular-nums" data-testid="drawdown-table">
      <thead>
        <tr className="border-b border-rule">
          <th scope="col">Time</th>
          <th scope="col" className="text-right">
            Depth
          </th>
          <th scope="col" className="text-right">
            Flow
          </th>
          <th scope="col" className="text-right">
            Left
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((p, i) => (
          <tr key={i} className="border-b border-rule/60">
            <td>{formatQuantity('time', p.time_s, system)}</td>
            <td className="text-right">{formatQuantity('length', p.depth_m, system)}</td>
            <td className="text-right">{formatQuantity('flow', p.flow_m3_s, system)}</td>
            <td className="text-right">{formatQuantity('volume', p.volume_m3, system)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
