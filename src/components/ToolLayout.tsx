import type { ReactElement, ReactNode } from 'react';
import UnitToggle from './UnitToggle';

interface Props {
  inputs: ReactNode;
  result: ReactNode;
  footer?: ReactNode;
}

/** Inputs then the result on a phone; side by side on a wide screen. */
export default function ToolLayout({ inputs, result, footer }: Props): ReactElement {
  return (
    <div className="space-y-5">
      <div className="flex justify-end">
        <UnitToggle />
      </div>
      <div className="grid gap-6 lg:grid-cols-2">
        <div className="min-w-0 space-y-6">{inputs}</div>
        <div className="min-w-0 space-y-4" aria-live="polite">
          {result}
        </div>
      </div>
      {footer}
    </div>
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
