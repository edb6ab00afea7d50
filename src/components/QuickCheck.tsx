import { useMemo, useRef } from 'react';
import type { ReactElement } from 'react';
import type { QuickMode, QuickState } from '../lib/calculators/quick-check';
import { QUICK_DEFAULTS, QUICK_US_START } from '../lib/calculators/quick-check';
import type { QuickAnswer } from '../lib/calculators/quick-result';
import { figureValue, quickAnswer } from '../lib/calculators/quick-result';
import { quickFlag } from '../lib/flags/quick-flag';
import type { UnitSystem } from '../lib/hydraulics/units';
import { formatQuantity } from '../lib/hydraulics/units';
import { PendingInputsProvider, usePendingInputs } from '../lib/stores/pending-inputs';
import { useCalcState, useUnitSystem } from '../lib/stores/use-calc-state';
import CautionNotes from './CautionNotes';
import ChoiceButtons from './ChoiceButtons';
import FigureList from './FigureList';
import QuickInputs from './QuickInputs';
import ResultActions from './ResultActions';
import ShareLink from './ShareLink';
import { StaleNotice, staleClass } from './ToolLayout';
import UnitToggle from './UnitToggle';
import VerdictBanner from './VerdictBanner';
import VerdictDock from './VerdictDock';
import WarningList from './WarningList';

const MODES = [
  { value: 'siphon', label: 'Siphon' },
  { value: 'line', label: 'Gravity line' },
  { value: 'tank', label: 'Empty a tank' },
];

const FULL_TOOL: Record<QuickMode, { href: string; label: string }> = {
  siphon: { href: '/siphon', label: 'Open the full siphon tool' },
  line: { href: '/gravity-line', label: 'Open the full gravity-line tool' },
  tank: { href: '/drain', label: 'Open the full drain-down tool' },
};

function Limits({ a, system }: { a: QuickAnswer; system: UnitSystem }): ReactElement | null {
  const items: string[] = [];
  if (a.biggest)
    items.push(
      `Biggest loss: ${a.biggest.name.toLowerCase()}, ${Math.round(a.biggest.share * 100)} % of the head (${formatQuantity('length', a.biggest.head_m, system)}).`,
    );
  if (a.crestMarginM !== undefined)
    items.push(
      a.crestMarginM >= 0
        ? `Crest margin: the crest could rise ${formatQuantity('length', a.crestMarginM, system)} more before the working limit.`
        : `Crest margin: the crest is ${formatQuantity('length', -a.crestMarginM, system)} past the working limit — lower it by that much.`,
    );
  if (items.length === 0) return null;
  return (
    <section aria-label="What limits it" className="rounded-lg border border-rule bg-white p-3">
      <h3 className="font-extrabold">What limits it</h3>
      <ul className="mt-1 list-disc space-y-1 pl-5" data-testid="limits">
        {items.map((t) => (
          <li key={t}>{t}</li>
        ))}
      </ul>
    </section>
  );
}

/** The quick check: pick a set-up, type a few numbers, read the verdict and the cautions. */
export default function QuickCheck(): ReactElement {
  const system = useUnitSystem();
  const { state, update, query } = useCalcState<QuickState>(
    QUICK_DEFAULTS,
    {},
    true,
    QUICK_US_START,
  );
  const answer = useMemo(() => quickAnswer(state), [state]);
  const resultRef = useRef<HTMLElement>(null);
  const pending = usePendingInputs();
  return (
    <PendingInputsProvider value={pending.tracker}>
      <div className="space-y-5">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <ChoiceButtons
            legend="What are you setting up?"
            name="mode"
            value={state.mode}
            choices={MODES}
            onChange={(v) => update({ mode: v as QuickMode })}
          />
          <UnitToggle />
        </div>
        <QuickInputs s={state} update={update} system={system} />
        <div aria-live="polite">
          <StaleNotice pending={pending.count} />
        </div>
        <div
          className={`grid gap-4 md:grid-cols-[3fr_2fr]${staleClass(pending.count)}`}
          aria-live="polite"
        >
          {'error' in answer ? (
            <p
              role="alert"
              className="rounded-lg border-l-8 border-verdict-fails bg-verdict-fails-wash p-4 font-semibold"
            >
              {answer.error}
            </p>
          ) : (
            <>
              <section
                id="quick-result"
                ref={resultRef}
                aria-label="Result"
                className="min-w-0 scroll-mt-4 space-y-3"
              >
                {/* The outline needs a level-2 heading before the result's own h3s. */}
                <h2 className="sr-only">Result</h2>
                <VerdictBanner verdict={answer.verdict} />
                <FigureList figures={answer.figures} system={system} />
                <Limits a={answer} system={system} />
                <WarningList warnings={answer.warnings} />
                <QuickActions state={state} answer={answer} system={system} query={query} />
              </section>
              <CautionNotes ids={answer.cautions} />
            </>
          )}
        </div>
        {!('error' in answer) && (
          <VerdictDock
            tone={answer.verdict.tone}
            word={answer.verdict.word}
            detail={answer.figures
              .slice(0, 2)
              .map((f) => figureValue(f, system))
              .join(' · ')}
            target={resultRef}
            stale={pending.count > 0}
          />
        )}
        <div className="flex flex-wrap items-center justify-between gap-3">
          <a
            href={`${FULL_TOOL[state.mode].href}`}
            className="flex min-h-11 items-center font-semibold text-teal-deep underline"
          >
            {FULL_TOOL[state.mode].label}
          </a>
          <ShareLink query={query} />
        </div>
      </div>
    </PendingInputsProvider>
  );
}

/** Save and flag under the quick check's answer, with the engine request the answer came from. */
function QuickActions(p: {
  state: QuickState;
  answer: QuickAnswer;
  system: UnitSystem;
  query: string;
}): ReactElement | null {
  const calc = quickFlag(p.state, p.answer);
  if (!calc) return null;
  return <ResultActions {...calc} unitSystem={p.system} path="/check" query={p.query} />;
}
