/**
 * Electronic state tags. A ground-state tag names the state the tabulated ΔfH° already describes
 * (the thermally populated ground term at 298 K), so it maps to the untagged entry. An excited
 * state adds its excitation energy, taken from the level energy T0 in cm⁻¹ (converted with CODATA
 * constants). Atomic levels: NIST Atomic Spectra Database (Kramida et al.), lowest J of the term;
 * O2 levels: Huber & Herzberg, Constants of Diatomic Molecules (1979). Both from memory.
 */

/** Tags that denote the ground state, per formula. */
export const GROUND_STATE_TAGS: Readonly<Record<string, readonly string[]>> = {
  H: ['2S', '2S1/2'],
  C: ['3P', '3P0'],
  N: ['4S', '4S3/2'],
  O: ['3P', '3P2'],
  F: ['2P', '2P3/2'],
  S: ['3P', '3P2'],
  Cl: ['2P', '2P3/2'],
  Br: ['2P', '2P3/2'],
  I: ['2P', '2P3/2'],
  O2: ['X', 'X3Σg-', 'X3Σg−', '3Σg-', '3Σg−'],
  N2: ['X', 'X1Σg+', '1Σg+'],
};

export interface ExcitedState {
  /** Tags that name this state (the first is the display form). */
  tags: readonly string[];
  /** Level energy above the ground level, cm⁻¹. */
  wavenumber: number;
  source: string;
}

const ASD = 'NIST Atomic Spectra Database level energy, from memory';
const HUBER_HERZBERG = 'Huber & Herzberg, Constants of Diatomic Molecules (1979), T0, from memory';

/** Known excited states, per formula. */
export const EXCITED_STATES: Readonly<Record<string, readonly ExcitedState[]>> = {
  O: [
    { tags: ['1D', '1D2'], wavenumber: 15867.862, source: ASD },
    { tags: ['1S', '1S0'], wavenumber: 33792.583, source: ASD },
  ],
  N: [{ tags: ['2D', '2D5/2'], wavenumber: 19224.464, source: ASD }],
  C: [{ tags: ['1D', '1D2'], wavenumber: 10192.66, source: ASD }],
  S: [{ tags: ['1D', '1D2'], wavenumber: 9238.609, source: ASD }],
  Cl: [{ tags: ['2P1/2'], wavenumber: 882.3515, source: ASD }],
  Br: [{ tags: ['2P1/2'], wavenumber: 3685.24, source: ASD }],
  I: [{ tags: ['2P1/2'], wavenumber: 7603.15, source: ASD }],
  O2: [
    { tags: ['a1Δg', 'a1Δ', '1Δg', 'a'], wavenumber: 7882.39, source: HUBER_HERZBERG },
    { tags: ['b1Σg+', 'b1Σ+', '1Σg+', 'b'], wavenumber: 13120.91, source: HUBER_HERZBERG },
  ],
};
