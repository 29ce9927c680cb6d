/**
 * The demo mechanisms of the Saltmarsh network (examples/*.steps), shipped with the client as
 * text and loaded only when someone asks for one.
 */
export interface DemoExample {
  id: string;
  title: string;
  blurb: string;
}

export const DEMO_EXAMPLES: DemoExample[] = [
  { id: 'salt-lake-bromine', title: 'Salt-lake bromine cycle', blurb: 'Bromine radicals destroying ozone over the field station’s salt pan.' },
  { id: 'co-oxidation-surface', title: 'CO oxidation on a platinum-group surface', blurb: 'Adsorbed species and surface sites of the catalysis group.' },
  { id: 'iodide-peroxide', title: 'Iodide-catalysed peroxide decomposition', blurb: 'A two-step catalytic cycle in solution.' },
];

const loaders = import.meta.glob<string>('../../../examples/*.steps', { query: '?raw', import: 'default' });

/** The text of one example, by id; rejects for an unknown id. */
export async function loadExampleText(id: string): Promise<string> {
  const load = loaders[`../../../examples/${id}.steps`];
  if (!load) throw new Error(`There is no example called “${id}”.`);
  return load();
}

export function isDemoExample(id: unknown): id is string {
  return typeof id === 'string' && DEMO_EXAMPLES.some((example) => example.id === id);
}
