/**
 * Drainwright's verdict words. Three tones, each with its own word, icon and theme colour, so
 * the verdict reads without colour: 'runs' (it works), 'edge' (works, but close to a limit or
 * slow), 'fails' (it will not do the job).
 */
import type { DrainResult, LineResult, SiphonResult, Warning } from '../hydraulics';

export type VerdictTone = 'runs' | 'edge' | 'fails';

export interface Verdict {
  tone: VerdictTone;
  /** Short headline in our own words. */
  word: string;
  /** One sentence saying why. */
  reason: string;
}

export function siphonVerdict(r: SiphonResult): Verdict {
  switch (r.status) {
    case 'runs':
      return { tone: 'runs', word: 'Will run', reason: 'Crest pressure stays above the working limit.' };
    case 'marginal':
      return {
        tone: 'edge',
        word: 'On the edge',
        reason: 'It can run, but the crest is inside the safety margin: air may gather and stop it.',
      };
    case 'breaks':
      return {
        tone: 'fails',
        word: 'Won’t hold',
        reason: 'The crest is too high for this flow: the water would boil off at the crest.',
      };
    default:
      return { tone: 'fails', word: 'No flow', reason: 'The outlet is not below the water surface.' };
  }
}

export function lineVerdict(r: LineResult): Verdict {
  if (r.status === 'no_flow')
    return { tone: 'fails', word: 'No flow', reason: 'The outlet is not below the water surface.' };
  if (r.regime !== 'turbulent')
    return { tone: 'edge', word: 'Trickles', reason: 'It flows, but slowly enough that the estimate is less certain.' };
  return { tone: 'runs', word: 'Will flow', reason: 'The water surface is above the outlet and the line runs full.' };
}

const has = (ws: Warning[], code: string): boolean => ws.some((w) => w.code === code);

export function drainVerdict(r: DrainResult): Verdict {
  if (r.status === 'no_flow')
    return { tone: 'fails', word: 'Won’t drain', reason: 'No outlet gives water at the starting level.' };
  if (r.status === 'stops_early') {
    const why =
      r.stop_reason === 'siphon_breaks'
        ? 'the siphon is expected to break as the level falls'
        : r.stop_reason === 'intake_uncovered'
          ? 'the level reaches the intake or hole'
          : 'the head runs out';
    return { tone: 'edge', word: 'Stops short', reason: `It stops before the target level: ${why}.` };
  }
  if (has(r.warnings, 'long_drain_time'))
    return { tone: 'edge', word: 'Empties, slowly', reason: 'It reaches the target, but it takes more than a day.' };
  return { tone: 'runs', word: 'Empties', reason: 'It drains to the target level.' };
}
