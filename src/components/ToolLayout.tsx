import type { ReactElement, ReactNode } from 'react';
import { PendingInputsProvider, usePendingInputs } from '../lib/stores/pending-inputs';
import UnitToggle from './UnitToggle';

interface Props {
  inputs: ReactNode;
  result: ReactNode;
  footer?: ReactNode;
}

/** Inputs then the result on a phone; side by side on a wide screen. */
export default function ToolLayout({ inputs, result, footer }: Props): ReactElement {
  const pending = usePendingInputs();
  return (
    <PendingInputsProvider value={pending.tracker}>
      <div className="space-y-5">
        <div className="flex justify-end">
          <UnitToggle />
        </div>
        <div className="grid gap-6 lg:grid-cols-2">
          <div className="min-w-0 space-y-6">{inputs}</div>
          <div className="min-w-0 space-y-4" aria-live="polite">
            <StaleResult pending={pending.count}>{result}</StaleResult>
          </div>
        </div>
        {footer}
      </div>
    </PendingInputsProvider>
  );
}

/** The notice above a result while `pending` boxes hold no accepted value; none otherwise. */
export function StaleNotice({ pending }: { pending: number }): ReactElement | null {
  if (pending === 0) return null;
  const boxes = pending === 1 ? '1 box above is' : `${pending} boxes above are`;
  return (
    <p
      data-testid="stale-notice"
      className="rounded-lg border-l-8 border-ink-soft bg-paper-deep p-3 font-semibold"
    >
      Not updated: {boxes} empty or not accepted. The result below is for the last values the tool
      accepted; fix the marked box to see the answer for what you typed.
    </p>
  );
}

/** Classes that dim a result while it is stale. */
export const staleClass = (pending: number): string => (pending > 0 ? ' opacity-50' : '');

/**
 * The result, dimmed under a notice while `pending` boxes hold no accepted value: it is still the
 * answer for the last accepted inputs, not for what the boxes show. The result keeps its place in
 * the tree either way, so its own state (an open chart, a half-typed job title) survives.
 */
function StaleResult({
  pending,
  children,
}: {
  pending: number;
  children: ReactNode;
}): ReactElement {
  return (
    <>
      <StaleNotice pending={pending} />
      <div data-stale={pending > 0 || undefined} className={`space-y-4${staleClass(pending)}`}>
        {children}
      </div>
    </>
  );
}

/** A titled group of inputs. */
export function InputGroup({
  title,
  children,
}: {
  title: string;
  children: ReactNode;
}): ReactElement {
  return (
    <section aria-label={title} className="space-y-3">
      <h2 className="border-b border-rule pb-1 text-step-1 font-extrabold">{title}</h2>
      {children}
    </section>
  );
}

/** The result's error box: the engine's message naming the input to fix. */
export function InputProblem({ text }: { text: string }): ReactElement {
  return (
    <p
      role="alert"
      className="rounded-lg border-l-8 border-verdict-fails bg-verdict-fails-wash p-4 font-semibold"
    >
      {text}
    </p>
  );
}

/** "What would help" hints; `busy` while newer ones are being worked out for changed inputs. */
export function HintList({
  hints,
  busy = false,
}: {
  hints: { id: string; text: string }[];
  busy?: boolean;
}): ReactElement | null {
  if (hints.length === 0) return null;
  return (
    <section
      aria-label="What would help"
      aria-busy={busy}
      className="rounded-lg border border-teal bg-teal-wash/50 p-3"
    >
      <h3 className="font-extrabold">
        What would help{busy && <span className="font-semibold text-ink-soft"> (updating…)</span>}
      </h3>
      <ul className="mt-1 list-disc space-y-1 pl-5" data-testid="hints">
        {hints.map((h) => (
          <li key={h.id} data-hint={h.id}>
            {h.text}
          </li>
        ))}
      </ul>
    </section>
  );
}
