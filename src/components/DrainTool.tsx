import { lazy, useMemo } from 'react';
import type { ReactElement } from 'react';
import type { DrainToolState } from '../lib/calculators/drain-tool';
import {
  DRAIN_TOOL_DEFAULTS,
  DRAIN_TOOL_US_START,
  STAGE_ROW,
  drainToolRequest,
  startDepthProblem,
} from '../lib/calculators/drain-tool';
import { inputErrorText } from '../lib/calculators/field-names';
import { drainFigures, STOP_WORDS } from '../lib/calculators/result-figures';
import { FITTING_ROW } from '../lib/calculators/tool-state';
import { drainVerdict } from '../lib/calculators/verdict';
import type { UnitSystem } from '../lib/hydraulics';
import { solveDrain } from '../lib/hydraulics';
import { useStagedTool } from '../lib/stores/use-staged-units';
import CautionNotes from './CautionNotes';
import { cautionIdsFor } from '../lib/cautions';
import ChartPanel from './ChartPanel';
import DrainHints from './DrainHints';
import type { SolvedDrain } from './DrainHints';
import DrainOutletFields from './DrainOutletFields';
import DrawdownTable from './DrawdownTable';
import FigureList from './FigureList';
import NumberField from './NumberField';
import ShareLink from './ShareLink';
import TankSchematic from './TankSchematic';
import ToolLayout, { InputGroup, InputProblem } from './ToolLayout';
import VerdictBanner from './VerdictBanner';
import VesselFields from './VesselFields';
import ResultActions from './ResultActions';
import WarningList from './WarningList';
import WaterSiteFields from './WaterSiteFields';

const DrawdownChart = lazy(() => import('./DrawdownChart'));

function compute(s: DrainToolState, system: UnitSystem): SolvedDrain | { error: string } {
  const depthProblem = startDepthProblem(s, system);
  if (depthProblem) return { error: depthProblem };
  try {
    const req = drainToolRequest(s);
    return { req, r: solveDrain(req), size: s.size, target: s.target_time_s };
  } catch (e) {
    return { error: inputErrorText(e) };
  }
}

/** The full drain-down tool: every vessel shape, every outlet, the drawdown curve, what would help. */
export default function DrainTool(): ReactElement {
  // Parts switched one at a time: vessel, outlet, water and time, figures, drawings.
  const {
    state: s,
    update,
    query,
    units,
    figuresIn,
    drawingsIn,
  } = useStagedTool<DrainToolState>(
    DRAIN_TOOL_DEFAULTS,
    { fittings: FITTING_ROW, stage: STAGE_ROW },
    DRAIN_TOOL_US_START,
  );
  const out = useMemo(() => compute(s, figuresIn), [s, figuresIn]);
  const inputs = (
    <>
      <InputGroup title="Vessel, basin or pond">
        <VesselFields s={s} update={update} system={units.at(0)} />
      </InputGroup>
      <InputGroup title="Outlet">
        <DrainOutletFields s={s} update={update} system={units.at(1)} />
      </InputGroup>
      <InputGroup title="Water and site">
        <WaterSiteFields s={s} update={update} system={units.at(2)} />
      </InputGroup>
      <InputGroup title="Time you have (optional)">
        <NumberField
          name="target_time_s"
          label="The job may take"
          kind="time"
          system={units.at(2)}
          value={s.target_time_s}
          onChange={(v) => update({ target_time_s: v })}
          hint="0 for none"
        />
      </InputGroup>
    </>
  );
  const cautions = cautionIdsFor({ tool: 'drain', outlet: s.outlet });
  const result =
    'error' in out ? (
      <InputProblem text={out.error} />
    ) : (
      <>
        <VerdictBanner verdict={drainVerdict(out.r)} />
        <FigureList figures={drainFigures(out.r)} system={figuresIn} />
        <p data-testid="limits">It stops when {STOP_WORDS[out.r.stop_reason]}.</p>
        <WarningList warnings={out.r.warnings} />
        <CautionNotes ids={cautions} />
        <ResultActions
          tool="drain"
          inputs={out.req}
          results={out.r}
          unitSystem={units.system}
          path="/drain"
          query={query}
        />
        <TankSchematic s={s} system={drawingsIn} />
        {out.r.status !== 'no_flow' && (
          <ChartPanel
            title="Drawdown"
            table={<DrawdownTable curve={out.r.curve} system={drawingsIn} />}
            chart={() => <DrawdownChart curve={out.r.curve} system={drawingsIn} />}
          />
        )}
        <DrainHints solved={out} system={figuresIn} />
      </>
    );
  return <ToolLayout inputs={inputs} result={result} footer={<ShareLink query={query} />} />;
}
