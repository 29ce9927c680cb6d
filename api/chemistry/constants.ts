/**
 * Physical constants, CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93 (2021) 025010; NIST
 * "CODATA Internationally recommended 2018 values"). Since the 2019 SI redefinition h, c, N_A, k_B
 * and e are exact; R = N_A·k_B is therefore exact too.
 */

/** Planck constant, J s (exact). */
export const PLANCK_H = 6.62607015e-34;

/** Speed of light in vacuum, m s⁻¹ (exact). */
export const SPEED_OF_LIGHT_C = 299_792_458;

/** Avogadro constant, mol⁻¹ (exact). */
export const AVOGADRO_NA = 6.02214076e23;

/** Boltzmann constant, J K⁻¹ (exact). */
export const BOLTZMANN_KB = 1.380649e-23;

/** Elementary charge, C (exact). */
export const ELEMENTARY_CHARGE_E = 1.602176634e-19;

/** Molar gas constant R = N_A·k_B, J mol⁻¹ K⁻¹ (exact: 8.314 462 618… ). */
export const GAS_CONSTANT_R = AVOGADRO_NA * BOLTZMANN_KB;

/**
 * N_A·h·c in kJ mol⁻¹ nm (119 626.565 6…): the molar energy of a photon of wavelength λ is
 * N_A·h·c / λ, so a step needing ΔH (kJ/mol) has the threshold λ = N_A·h·c / ΔH in nm.
 */
export const MOLAR_PHOTON_ENERGY_KJ_NM = (AVOGADRO_NA * PLANCK_H * SPEED_OF_LIGHT_C * 1e9) / 1e3;

/** Molar energy of one wavenumber, kJ mol⁻¹ per cm⁻¹ (N_A·h·c·100 cm/m / 1000 J/kJ ≈ 0.011 962 66). */
export const KJ_PER_MOL_PER_WAVENUMBER = (AVOGADRO_NA * PLANCK_H * SPEED_OF_LIGHT_C * 100) / 1e3;
