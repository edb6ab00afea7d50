import { Suspense, useState } from 'react';
import type { ReactElement, ReactNode } from 'react';

interface Props {
  title: string;
  /** The text-table alternative, always present. */
  table: ReactNode;
  /** The chart; rendered (and its code fetched) only after the crew asks for it. */
  chart: () => ReactNode;
}

/** A chart that loads on demand, with its table shown beside it for every reader. */
export default function ChartPanel({ title, table, chart }: Props): ReactElement {
  const [open, setOpen] = useState(false);
  return (
    <section aria-label={title} className="min-w-0 rounded-lg border border-rule bg-white p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-extrabold">{title}</h3>
        <button
          type="button"
          aria-expanded={open}
          onClick={() => setOpen(!open)}
          className="min-h-11 rounded-lg border border-rule px-3 font-semibold text-teal-deep"
        >
          {open ? 'Hide chart' : 'Show chart'}
        </button>
      </div>
      {open && (
        <div className="relative mt-2 h-64">
          <Suspense fallback={<p className="text-ink-faint">Loading the chart…</p>}>{chart()}</Suspense>
        </div>
      )}
      {/* Focusable so keyboard users can scroll a long table. */}
      <div className="mt-2 max-h-72 overflow-auto" tabIndex={0} role="region" aria-label={`${title}: table`}>
        {table}
      </div>
    </section>
  );
}
