/** Demo calculations attached to the demo jobs; results are computed by the engine at seed time. */
export interface DemoCalculation {
  id: string;
  jobId: string;
  tool: 'line' | 'siphon' | 'drain';
  label: string;
  inputs: unknown;
  results: unknown;
  unitSystem: 'metric' | 'us';
  engineVersion: string;
}

/** Filled in once the engine lands; until then the demo jobs carry no calculations. */
export function demoCalculations(): DemoCalculation[] {
  return [];
}
