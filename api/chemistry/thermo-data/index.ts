import { OXYGEN_HYDROGEN } from './oxygen-hydrogen';
import type { ThermoRecord } from './types';

export type { ThermoRecord } from './types';

/** The whole built-in table. */
export const THERMO_RECORDS: readonly ThermoRecord[] = [...OXYGEN_HYDROGEN];
