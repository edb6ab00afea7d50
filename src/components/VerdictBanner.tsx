import type { ReactElement } from 'react';
import type { Verdict, VerdictTone } from '../lib/calculators/verdict';

const TONE: Record<VerdictTone, { box: string; icon: string; path: string; label: string }> = {
  runs: {
    box: 'border-verdict-runs bg-verdict-runs-wash',
    icon: 'fill-verdict-runs',
    label: 'Works',
    // a drop with a tick
    path: 'M12 2C8 7 5 10.5 5 14a7 7 0 0 0 14 0c0-3.5-3-7-7-12Zm-1.2 15.4-3.3-3.3 1.4-1.4 1.9 1.9 4.3-4.3 1.4 1.4-5.7 5.7Z',
  },
  edge: {
    box: 'border-verdict-edge bg-verdict-edge-wash',
    icon: 'fill-verdict-edge',
    label: 'Caution',
    // a triangle with a bar and dot
    path: 'M12 2 1 21h22L12 2Zm1 15h-2v2h2v-2Zm0-7h-2v5h2v-5Z',
  },
  fails: {
    box: 'border-verdict-fails bg-verdict-fails-wash',
    icon: 'fill-verdict-fails',
    label: 'Does not work',
    // a square turned on its corner with a cross
    path: 'M12 1 23 12 12 23 1 12 12 1Zm-2.8 7.8-1.4 1.4 1.8 1.8-1.8 1.8 1.4 1.4 1.8-1.8 1.8 1.8 1.4-1.4-1.8-1.8 1.8-1.8-1.4-1.4-1.8 1.8-1.8-1.8Z',
  },
};

/** The verdict first: an icon, a word and a reason on the verdict colour. */
export default function VerdictBanner({ verdict }: { verdict: Verdict }): ReactElement {
  const t = TONE[verdict.tone];
  return (
    <div
      role="status"
      data-verdict={verdict.tone}
      className={`flex items-start gap-3 rounded-lg border-l-8 p-4 ${t.box}`}
    >
      <svg viewBox="0 0 24 24" className={`h-10 w-10 shrink-0 ${t.icon}`} role="img" aria-label={t.label}>
        <path d={t.path} />
      </svg>
      <div className="min-w-0">
        <p className="text-step-3 leading-none font-extrabold" data-testid="verdict-word">
          {verdict.word}
        </p>
        <p className="mt-1 text-ink-soft">{verdict.reason}</p>
      </div>
    </div>
  );
}
