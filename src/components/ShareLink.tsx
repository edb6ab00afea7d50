import { useState } from 'react';
import type { ReactElement } from 'react';
import { useHydrated } from '../lib/stores/use-calc-state';

/** The link to this result, with a copy button (the address bar carries it too). */
export default function ShareLink({ query }: { query: string }): ReactElement {
  const [copied, setCopied] = useState(false);
  const hydrated = useHydrated();
  const href = !hydrated ? '' : `${window.location.origin}${window.location.pathname}${query ? `?${query}` : ''}`;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <a href={href || '?'} data-testid="share-link" className="min-h-11 content-center font-semibold text-teal-deep underline">
        Link to this result
      </a>
      <button
        type="button"
        className="min-h-11 rounded-lg border border-rule bg-white px-3 font-semibold"
        onClick={() => {
          navigator.clipboard?.writeText(href).then(
            () => setCopied(true),
            () => setCopied(false),
          );
        }}
      >
        {copied ? 'Copied' : 'Copy link'}
      </button>
    </div>
  );
}
