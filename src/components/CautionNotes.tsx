import type { ReactElement } from 'react';
import { cautionsFor } from '../lib/cautions';

/** The site cautions that apply to the result beside which they are shown. */
export default function CautionNotes({ ids }: { ids: readonly string[] }): ReactElement {
  return (
    <aside aria-label="Cautions for this set-up" className="rounded-lg border-l-4 border-verdict-edge bg-verdict-edge-wash p-4">
      <h3 className="mb-2 text-step-1 font-extrabold">Cautions for this set-up</h3>
      <ul className="space-y-2">
        {cautionsFor(ids).map((c) => (
          <li key={c.id} data-caution={c.id}>
            <strong>{c.title}.</strong> {c.text}
          </li>
        ))}
      </ul>
      <p className="mt-2 text-step--1">
        <a href="/cautions" className="font-semibold text-teal-deep underline">
          All site cautions
        </a>
      </p>
    </aside>
  );
}
