import type { FLAG_REASONS, FLAG_STATUSES, FLAG_TOOLS } from '../../../db/schema/flags';

export type FlagReason = (typeof FLAG_REASONS)[number];
export type FlagStatus = (typeof FLAG_STATUSES)[number];
export type FlagTool = (typeof FLAG_TOOLS)[number];

/** What the reporter picks when flagging, in our own words. */
export const REASON_LABELS: Record<FlagReason, string> = {
  looks_wrong: 'This looks wrong',
  site_differs: 'The site result was different',
  need_help: 'Help me with my inputs',
};

/** How each status reads to staff and to the reporter. */
export const STATUS_LABELS: Record<FlagStatus, string> = {
  new: 'New',
  in_hand: 'Being looked at',
  waiting_on_reporter: 'Waiting on reporter',
  answered: 'Answered',
  closed: 'Closed',
};

export const TOOL_LABELS: Record<FlagTool, string> = {
  line: 'Gravity line',
  siphon: 'Siphon',
  drain: 'Drain-down',
};
