import { useMemo } from 'react';
import type { ReactElement } from 'react';
import { inputErrorText } from '../lib/calculators/field-names';
import { lineHints } from '../lib/calculators/hints';
import { biggestLoss } from '../lib/calculators/limits';
import type { LineToolState } from '../lib/calculators/line-tool';
import { LINE_TOOL_DEFAULTS, LINE_TOOL_US_START, lineToolRequest } from '../lib/calculators/line-tool';
import { FITTING_ROW } from '../lib/calculators/tool-state';
import { lineVerdict } from '../lib/calculators/verdict';
import type { UnitSystem } from '../lib/hydraulics';
import { formatQuantity, solveLine } from '../lib/hydraulics';
import { useStagedTool } from '../lib/stores/use-staged-units';
import CautionNotes from './CautionNotes';
import { cautionIdsFor } from '../lib/cautions';
import FigureList from './FigureList';
import LevelFields from './LevelFields';
import LineFields from './LineFields';
import { FlowFacts, LossPanel, lineFigures } from './LineResultParts';
import LineSchematic from './LineSchematic';
import NumberField from './NumberField';
import ShareLink from './ShareLink';
import ToolLayout, { HintList, InputGroup, InputProblem } from './ToolLayout';
import VerdictBanner from './VerdictBanner';
import ResultActions from './ResultActions';
import WarningList from './WarningList';
import WaterSiteFields from './WaterSiteFields';

function compute(s: LineToolState, system: UnitSystem) {
  try {
    const req = lineToolRequest(s);
    const r = solveLine(req);
    return {
      req,
      r,
      big: biggestLoss(r.losses_m),
      hints: lineHints(req, s.size, s.target_flow_m3_s, system),
    };
  } catch (e) {
    return { error: inputErrorText(e) };
  }
}

/** The full gravity-line tool: every engine input, the loss breakdown and what would help. */
export default function GravityLineTool(): ReactElement {
  // Parts switched one at a time: levels, line, water and target, figures, drawings.
  const {
    state: s,
    update,
    query,
    units,
    figuresIn,
    drawingsIn,
  } = useStagedTool<LineToolState>(
    LINE_TOOL_DEFAULTS,
    { fittings: FITTING_ROW },
    LINE_TOOL_US_START,
  );
  const out = useMemo(() => compute(s, figuresIn), [s, figuresIn]);
  const inputs = (
    <>
      <InputGroup title="Levels">
        <LevelFields s={s} update={update} system={units.at(0)} />
      </InputGroup>
      <InputGroup title="Hose or pipe">
        <LineFields s={s} update={update} system={units.at(1)} />
      </InputGroup>
      <InputGroup title="Water and site">
        <WaterSiteFields s={s} update={update} system={units.at(2)} />
      </InputGroup>
      <InputGroup title="Target (optional)">
        <NumberField
          name="target_flow_m3_s"
          label="Flow you need"
          kind="flow"
          system={units.at(2)}
          value={s.target_flow_m3_s}
          onChange={(v) => update({ target_flow_m3_s: v })}
          hint="0 for none; sizes the line for you"
        />
      </InputGroup>
    </>
  );
  const result =
    'error' in out ? (
      <InputProblem text={out.error!} />
    ) : (
      <>
        <VerdictBanner verdict={lineVerdict(out.r)} />
        <FigureList figures={lineFigures(out.r)} system={figuresIn} />
        <FlowFacts r={out.r} />
        {out.big && (
          <p data-testid="limits">
            What limits it: {out.big.name.toLowerCase()}, {Math.round(out.big.share * 100)} % of the
            head ({formatQuantity('length', out.big.head_m, figuresIn)}).
          </p>
        )}
        <WarningList warnings={out.r.warnings} />
        <CautionNotes ids={cautionIdsFor({ tool: 'line' })} />
        <ResultActions
          tool="line"
          inputs={out.req}
          results={out.r}
          unitSystem={units.system}
          path="/gravity-line"
          query={query}
        />
        <LineSchematic
          sourceLevelM={s.source_level_m}
          outletM={s.outlet_m}
          tailwaterM={s.has_tail ? s.tailwater_m : undefined}
          system={drawingsIn}
        />
        <LossPanel r={out.r} system={drawingsIn} />
        <HintList hints={out.hints} />
      </>
    );
  return <ToolLayout inputs={inputs} result={result} footer={<ShareLink query={query} />} />;
}
