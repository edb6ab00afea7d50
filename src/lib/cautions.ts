/**
 * The site cautions a crew must see beside the result they concern. Our own wording; the pages,
 * reports and the quick check pick the ones that apply by id.
 */
export interface Caution {
  id: string;
  title: string;
  text: string;
}

export const CAUTIONS: readonly Caution[] = [
  {
    id: 'no-mouth-priming',
    title: 'Never prime by mouth',
    text: 'Fill the hose by submerging it, with a hand pump or a priming valve. A mouthful of pond, flood or tank water can make you ill.',
  },
  {
    id: 'contaminated-water',
    title: 'Treat the water as contaminated',
    text: 'Pond, flood, trench and tank water can carry sewage, chemicals and germs. Wear gloves and eye protection, wash before eating, and keep these hoses apart from drinking-water ones.',
  },
  {
    id: 'intake-entrapment',
    title: 'Keep people clear of the intake',
    text: 'A running intake can pin a limb or hair against it. Fit a strainer or cage and keep swimmers, children and animals out of the water while it runs.',
  },
  {
    id: 'edges-and-confined-spaces',
    title: 'Edges, trenches and tanks',
    text: 'Stay back from open water, soft banks and excavation edges. Trenches, pits and tanks can be confined spaces: do not enter without the right permit, gas test and standby.',
  },
  {
    id: 'discharge',
    title: 'Check where the water goes',
    text: 'Discharge can scour soil, flood neighbours or carry silt and chemicals into storm drains and streams. Many places need permission first.',
  },
  {
    id: 'estimates',
    title: 'These are estimates',
    text: 'Figures come from published methods and the numbers you typed. Real hoses kink, intakes clog and levels change. Follow local codes and licensed practice.',
  },
];

/** Cautions by id, in the order given. */
export function cautionsFor(ids: readonly string[]): Caution[] {
  return ids.map((id) => CAUTIONS.find((c) => c.id === id)).filter((c): c is Caution => !!c);
}

/** What a calculation moves the water through: a tool, and for a drain its outlet when known. */
export type CautionSetup =
  | { tool: 'siphon' | 'line' }
  | { tool: 'drain'; outlet?: 'orifice' | 'line' | 'siphon' };

/**
 * The cautions that apply to one set-up, most urgent first. Every job handles open or stored
 * water near an edge, so contamination and edges always apply; priming only to a siphon, the
 * intake only to a hose or pipe. A drain whose outlet is not known gets all of them.
 */
export function cautionIdsFor(setup: CautionSetup): string[] {
  const outlet = setup.tool === 'drain' ? setup.outlet : setup.tool;
  const siphon = outlet === undefined || outlet === 'siphon';
  const intake = outlet !== 'orifice';
  return [
    ...(siphon ? ['no-mouth-priming'] : []),
    'contaminated-water',
    ...(intake ? ['intake-entrapment'] : []),
    'edges-and-confined-spaces',
    'discharge',
    'estimates',
  ];
}
