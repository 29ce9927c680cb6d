import { AQUEOUS } from './aqueous';
import { AQUEOUS_OXYANIONS } from './aqueous-oxyanions';
import { BROMINE } from './bromine';
import { CARBON_C1 } from './carbon-c1';
import { CARBON_C2 } from './carbon-c2';
import { CHLORINE } from './chlorine';
import { IODINE } from './iodine';
import { NITROGEN } from './nitrogen';
import { OXYGEN_HYDROGEN } from './oxygen-hydrogen';
import { SULFUR_FLUORINE } from './sulfur-fluorine';
import type { ThermoRecord } from './types';

export type { ThermoRecord } from './types';

/** The whole built-in table, one family per file. */
export const THERMO_RECORDS: readonly ThermoRecord[] = [
  ...OXYGEN_HYDROGEN,
  ...NITROGEN,
  ...CHLORINE,
  ...BROMINE,
  ...IODINE,
  ...CARBON_C1,
  ...CARBON_C2,
  ...SULFUR_FLUORINE,
  ...AQUEOUS,
  ...AQUEOUS_OXYANIONS,
];
