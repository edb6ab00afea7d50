import { lazy, useMemo } from 'react';
import type { ReactElement } from 'react';
import { inputErrorText } from '../lib/calculators/field-names';
import { siphonHints } from '../lib/calculators/hints';
import { biggestLoss, crestMarginM } from '../lib/calculators/limits';
import type { SiphonToolState } from '../lib/calculators/line-tool';
import { SIPHON_TOOL_DEFAULTS, SIPHON_TOOL_US_START, siphonToolRequest } from '../lib/calculators/line-tool';
import { siphonFigures } from '../lib/calculators/result-figures';
import { siphonProfile } from '../lib/calculators/siphon-profile';
import { FITTING_ROW } from '../lib/calculators/tool-state';
import { siphonVerdict } from '../lib/calculators/verdict';
import type { UnitSystem } from '../lib/hydraulics';
import {
  formatQuantity,
  resolveFluid,
  siphonBreakSourceLevel,
  solveSiphon,
} from '../lib/hydraulics';
import { useStagedTool } from '../lib/stores/use-staged-units';
import CautionNotes from './CautionNotes';
import ChartPanel from './ChartPanel';
import FigureList from './FigureList';
import LevelFields from './LevelFields';
import LineFields from './LineFields';
import { FlowFacts, LossPanel } from './LineResultParts';
import LineSchematic from './LineSchematic';
import NumberField from './NumberField';
import PressureTable from './PressureTable';
import ShareLink from './ShareLink';
import SiphonCrestFields from './SiphonCrestFields';
import ToolLayout, { HintList, InputGroup, InputProblem } from './ToolLayout';
import VerdictBanner from './VerdictBanner';
import ResultActions from './ResultActions';
import WarningList from './WarningList';
import WaterSiteFields from './WaterSiteFields';

const CrestPressureChart = lazy(() => import('./CrestPressureChart'));

function compute(s: SiphonToolState, system: UnitSystem) {
  try {
    const req = siphonToolRequest(s);
    const r = solveSiphon(req);
    return {
      req,
      r,
      big: biggestLoss(r.losses_m),
      margin:
        r.status === 'no_flow' ? undefined : crestMarginM(r, resolveFluid(req.fluid).density_kg_m3),
      breakAt: r.status === 'no_flow' ? null : siphonBreakSourceLevel(req),
      profile: r.status === 'no_flow' ? [] : siphonProfile(req, r),
      hints: siphonHints(req, r, s.size, s.target_flow_m3_s, system),
    };
  } catch (e) {
    return { error: inputErrorText(e) };
  }
}

/** The full siphon tool: flow, crest pressure against vapour pressure, priming, break level. */
export default function SiphonTool(): ReactElement {
  // Parts switched one at a time: levels and crest, line, water and target, figures, drawings.
  const {
    state: s,
    update,
    query,
    units,
    figuresIn,
    drawingsIn,
  } = useStagedTool<SiphonToolState>(
    SIPHON_TOOL_DEFAULTS,
    { fittings: FITTING_ROW },
    SIPHON_TOOL_US_START,
  );
  const out = useMemo(() => compute(s, figuresIn), [s, figuresIn]);
  const len = (m: number): string => formatQuantity('length', m, figuresIn);
  const inputs = (
    <>
      <InputGroup title="Levels">
        <LevelFields s={s} update={update} system={units.at(0)} />
      </InputGroup>
      <InputGroup title="Crest">
        <SiphonCrestFields s={s} update={update} system={units.at(0)} />
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
          hint="0 for none"
        />
      </InputGroup>
    </>
  );
  if ('error' in out)
    return <ToolLayout inputs={inputs} result={<InputProblem text={out.error!} />} />;
  const { r } = out;
  const figures = siphonFigures(r);
  const result = (
    <>
      <VerdictBanner verdict={siphonVerdict(r)} />
      <FigureList figures={figures} system={figuresIn} />
      <FlowFacts r={r} />
      <ul className="list-disc space-y-1 pl-5" data-testid="limits">
        {out.big && (
          <li>
            Biggest loss: {out.big.name.toLowerCase()}, {Math.round(out.big.share * 100)} % of the
            head ({len(out.big.head_m)}).
          </li>
        )}
        {out.margin !== undefined &&
          (out.margin >= 0 ? (
            <li>
              Crest margin: the crest could rise {len(out.margin)} more before the working limit.
            </li>
          ) : (
            <li>Crest margin: the crest is {len(-out.margin)} past the working limit.</li>
          ))}
        {out.breakAt !== null && out.breakAt !== undefined && (
          <li>
            As the source falls, the siphon is expected to break when its surface reaches{' '}
            {len(out.breakAt)} (elevation).
          </li>
        )}
      </ul>
      <WarningList warnings={r.warnings} />
      <CautionNotes ids={['no-mouth-priming', 'intake-entrapment', 'discharge', 'estimates']} />
      <ResultActions
        tool="siphon"
        inputs={out.req}
        results={r}
        unitSystem={units.system}
        path="/siphon"
        query={query}
      />
      <LineSchematic
        sourceLevelM={s.source_level_m}
        outletM={s.outlet_m}
        crestM={s.crest_m}
        tailwaterM={s.has_tail ? s.tailwater_m : undefined}
        system={drawingsIn}
      />
      {out.profile.length > 0 && (
        <ChartPanel
          title="Pressure along the siphon"
          table={
            <PressureTable
              points={out.profile}
              vaporPa={r.vapor_pressure_pa}
              limitPa={r.crest_limit_pa}
              system={drawingsIn}
            />
          }
          chart={() => (
            <CrestPressureChart
              points={out.profile}
              vaporPa={r.vapor_pressure_pa}
              limitPa={r.crest_limit_pa}
              system={drawingsIn}
            />
          )}
        />
      )}
      <LossPanel r={r} system={drawingsIn} />
      <HintList hints={out.hints} />
    </>
  );
  return <ToolLayout inputs={inputs} result={result} footer={<ShareLink query={query} />} />;
}
