/**
 * Warning codes and the plain words a crew reads beside a result. Messages carry no numbers with
 * units, so they read the same in metric and US customary; the numbers are in the result.
 */
import type { Regime, Warning } from './types';

/** Outlet velocity above which scour of soil or a ditch is likely, m/s (common practice). */
export const SCOUR_VELOCITY_M_S = 3;
/** Reynolds number beyond which the Moody chart and Colebrook's data end. */
export const RE_METHOD_MAX = 1e8;
/** Relative roughness beyond which the Moody chart ends (ε/D = 0.05). */
export const RELATIVE_ROUGHNESS_MAX = 0.05;

export const WARNING_MESSAGES = {
  no_head:
    'There is no head: the water surface is not above the outlet (or the tailwater), so nothing flows by gravity.',
  siphon_near_limit:
    'The siphon is close to its limit: pressure at the crest is below the planning margin above the water’s vapour pressure. Dissolved air may gather at the crest and stop the flow. Lower the crest, shorten the run to the crest or use a larger line.',
  siphon_breaks:
    'This siphon will not run full: pressure at the crest would fall below the water’s vapour pressure, so the water boils off and the line air-locks. The flow shown is the ideal one and will not be reached. Lower the crest or raise the source.',
  laminar_flow:
    'The flow is slow and laminar (Reynolds number 2000 or less). Friction is computed by the laminar law; small changes in water temperature change the flow noticeably.',
  transitional_flow:
    'The flow is between laminar and turbulent (Reynolds number 2000–4000). The friction factor here is an interpolation and less certain; the real flow may differ.',
  high_outlet_velocity:
    'Water leaves the outlet fast (over 3 m/s, about 10 ft/s). Expect scour: protect the discharge point with rock, a splash pad or a diffuser, and check where the water goes.',
  reynolds_out_of_range:
    'The Reynolds number is above 100 million, beyond the range the Colebrook–White equation was fitted to. Treat the friction result as an estimate.',
  roughness_out_of_range:
    'The pipe’s roughness is more than 5 % of its diameter, beyond the range of the Colebrook–White equation and the Moody chart. Treat the friction result as an estimate.',
  long_drain_time:
    'The job takes a very long time at this flow. Consider a larger line, more lines in parallel, or a pump.',
  intake_uncovered:
    'The water surface reaches the intake before the target level: the line will draw air and stop. Lower the intake to go further.',
  asymptotic_stop:
    'The flow slows toward zero as the level nears its stop, so the run is reported ending 1 mm above it.',
  siphon_breaks_during_drain:
    'As the level falls the crest pressure reaches its limit, and the siphon is expected to break before the target level.',
} as const;

export type WarningCode = keyof typeof WARNING_MESSAGES;

/** Build a Warning for a code, optionally with a sentence of detail appended. */
export function makeWarning(code: WarningCode, detail?: string): Warning {
  const message = WARNING_MESSAGES[code];
  return { code, message: detail ? `${message} ${detail}` : message };
}

/**
 * Warnings every full-pipe result shares: regime, scour velocity, method range.
 * @param velocityMS mean velocity at the outlet, m/s.
 */
export function flowWarnings(
  regime: Regime,
  reynolds: number,
  relativeRoughness: number,
  velocityMS: number,
): Warning[] {
  const out: Warning[] = [];
  if (reynolds > 0 && regime === 'laminar') out.push(makeWarning('laminar_flow'));
  if (regime === 'transitional') out.push(makeWarning('transitional_flow'));
  if (velocityMS > SCOUR_VELOCITY_M_S) out.push(makeWarning('high_outlet_velocity'));
  if (reynolds > RE_METHOD_MAX) out.push(makeWarning('reynolds_out_of_range'));
  if (relativeRoughness > RELATIVE_ROUGHNESS_MAX) out.push(makeWarning('roughness_out_of_range'));
  return out;
}
