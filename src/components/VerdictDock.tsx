import { useEffect, useState } from 'react';
import type { ReactElement, RefObject } from 'react';
import type { VerdictTone } from '../lib/calculators/verdict';

const TONE: Record<VerdictTone, string> = {
  runs: 'border-verdict-runs bg-verdict-runs-wash',
  edge: 'border-verdict-edge bg-verdict-edge-wash',
  fails: 'border-verdict-fails bg-verdict-fails-wash',
};

interface Props {
  tone: VerdictTone;
  word: string;
  detail: string;
  /** The full result; the dock hides while it is on screen. */
  target: RefObject<HTMLElement | null>;
  /** Some box holds no accepted value: the verdict is for the last accepted inputs. */
  stale?: boolean;
}

/**
 * A slim verdict pinned to the bottom of a phone screen while the full result is out of view,
 * so the answer shows at once as the crew types; tapping it jumps to the result.
 */
export default function VerdictDock({
  tone,
  word,
  detail,
  target,
  stale = false,
}: Props): ReactElement | null {
  const [hidden, setHidden] = useState(true);
  useEffect(() => {
    const el = target.current;
    if (!el || typeof IntersectionObserver === 'undefined') return;
    const io = new IntersectionObserver(([e]) => setHidden(!!e?.isIntersecting), {
      threshold: 0.01,
    });
    io.observe(el);
    return () => io.disconnect();
  }, [target]);
  if (hidden) return null;
  return (
    <a
      href="#quick-result"
      data-testid="verdict-dock"
      data-stale={stale || undefined}
      className={`fixed inset-x-2 bottom-2 z-10 flex min-h-12 items-center justify-between gap-3 rounded-lg border-l-8 px-4 py-2 shadow-lg md:hidden ${stale ? 'border-ink-soft bg-paper-deep' : TONE[tone]}`}
    >
      <span className="text-step-1 font-extrabold">{stale ? 'Not updated' : word}</span>
      <span className="truncate font-semibold tabular-nums">
        {stale ? 'Fix the marked box' : detail}
      </span>
    </a>
  );
}
