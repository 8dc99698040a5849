// The material library: tissue substitutes a slab can be made of, with the constants the engine
// needs. Composition-derived constants (Z/A, I, nominal density) are from NIST SRD 126 Table 2
// (Hubbell & Seltzer), which takes the tissue compositions from ICRU Report 44 (1989).
// Radiation lengths X0 by the Tsai formula from the same mass fractions (derived).

/** Which NIST SRD 126 coefficient column a material uses. */
export type CoefficientTableId = 'water' | 'air' | 'lung' | 'bone' | 'adipose' | 'muscle';
/** Which NIST ESTAR (SRD 124) stopping-power table a material uses. */
export type StoppingTableId = 'water' | 'air' | 'boneCorticalICRP' | 'softTissueICRP';

export const MATERIAL_IDS = [
  'water',
  'air',
  'lung',
  'adipose',
  'muscle',
  'softTissue',
  'corticalBone',
  'spongyBone',
  'custom',
] as const;
export type MaterialId = (typeof MATERIAL_IDS)[number];

/** One constituent of a material's coefficient mixture: a NIST column and its mass fraction. */
export interface MixturePart<T> {
  table: T;
  massFraction: number;
}

export interface Material {
  id: MaterialId;
  label: string;
  /** Density used when the layer gives no override (g/cm³). */
  defaultDensityGPerCm3: number;
  /** Ratio of atomic number to atomic mass, electrons per (g/mol). */
  zOverA: number;
  /** Mean excitation energy I (eV). */
  meanExcitationEnergyEV: number;
  /** Radiation length X0 (g/cm²). */
  radiationLengthGPerCm2: number;
  /** Photon coefficients: mass-fraction mixture of NIST columns (one part for tabulated media). */
  coefficients: MixturePart<CoefficientTableId>[];
  /** Electron stopping powers: mass-fraction mixture of ESTAR tables. */
  stopping: MixturePart<StoppingTableId>[];
  /** Where the constants come from, shown to the user. */
  source: string;
}

const one = <T>(table: T): MixturePart<T>[] => [{ table, massFraction: 1 }];

// Spongy (trabecular) bone has no ICRU-44 entry. It is modelled here as a mass-fraction mixture
// of cortical bone and skeletal muscle with the volume fraction that gives 1.18 g/cm³:
// f_vol = (1.18 − 1.05)/(1.92 − 1.05) = 0.1494, mass fraction of bone w = f_vol·1.92/1.18 = 0.2432.
// The density 1.18 g/cm³ is within the 1.1–1.2 g/cm³ usually quoted (from memory).
const SPONGY_BONE_MASS_FRACTION = 0.2432;

function mix(a: number, b: number, wa: number): number {
  return wa * a + (1 - wa) * b;
}

const LIBRARY: Record<MaterialId, Material> = {
  water: {
    id: 'water',
    label: 'Water',
    defaultDensityGPerCm3: 1.0,
    zOverA: 0.55508,
    meanExcitationEnergyEV: 75.0,
    radiationLengthGPerCm2: 36.08,
    coefficients: one('water'),
    stopping: one('water'),
    source: 'NIST SRD 126 Table 2; ESTAR liquid water',
  },
  air: {
    id: 'air',
    label: 'Air (dry)',
    defaultDensityGPerCm3: 0.001205,
    zOverA: 0.49919,
    meanExcitationEnergyEV: 85.7,
    radiationLengthGPerCm2: 36.62,
    coefficients: one('air'),
    stopping: one('air'),
    source: 'NIST SRD 126 Table 2 (air, dry, near sea level); ESTAR air',
  },
  lung: {
    id: 'lung',
    label: 'Lung (inflated)',
    // ICRU-44 lung composition at inflated-lung density 0.26 g/cm³ (ICRU 44/46, from memory;
    // 0.26 is also the mean bulk lung density measured in patients, JACMP bulk-density study).
    defaultDensityGPerCm3: 0.26,
    zOverA: 0.55048,
    meanExcitationEnergyEV: 75.2,
    radiationLengthGPerCm2: 36.53,
    coefficients: one('lung'),
    stopping: one('softTissueICRP'),
    source:
      'NIST SRD 126 Table 2 (lung tissue, ICRU-44 composition) at 0.26 g/cm³; ESTAR soft tissue (ICRP) as stopping-power proxy',
  },
  adipose: {
    id: 'adipose',
    label: 'Adipose tissue',
    defaultDensityGPerCm3: 0.95,
    zOverA: 0.55579,
    meanExcitationEnergyEV: 64.8,
    radiationLengthGPerCm2: 41.23,
    coefficients: one('adipose'),
    stopping: one('softTissueICRP'),
    source: 'NIST SRD 126 Table 2 (ICRU-44); ESTAR soft tissue (ICRP) as stopping-power proxy',
  },
  muscle: {
    id: 'muscle',
    label: 'Muscle (skeletal)',
    defaultDensityGPerCm3: 1.05,
    zOverA: 0.55,
    meanExcitationEnergyEV: 74.6,
    radiationLengthGPerCm2: 36.81,
    coefficients: one('muscle'),
    stopping: one('softTissueICRP'),
    source: 'NIST SRD 126 Table 2 (ICRU-44); ESTAR soft tissue (ICRP)',
  },
  softTissue: {
    id: 'softTissue',
    label: 'Soft tissue',
    defaultDensityGPerCm3: 1.06,
    zOverA: 0.54996,
    meanExcitationEnergyEV: 74.7,
    radiationLengthGPerCm2: 36.78,
    // No soft-tissue column in the coefficient tables: muscle's composition differs by < 0.3 % in
    // any element, so its μ/ρ and μ_en/ρ stand in.
    coefficients: one('muscle'),
    stopping: one('softTissueICRP'),
    source:
      'NIST SRD 126 Table 2 (ICRU-44) for Z/A and I; muscle coefficients as proxy; ESTAR soft tissue (ICRP)',
  },
  corticalBone: {
    id: 'corticalBone',
    label: 'Cortical bone',
    defaultDensityGPerCm3: 1.92,
    zOverA: 0.51478,
    meanExcitationEnergyEV: 112.0,
    radiationLengthGPerCm2: 26.99,
    coefficients: one('bone'),
    stopping: one('boneCorticalICRP'),
    source: 'NIST SRD 126 Table 2 (ICRU-44); ESTAR bone, cortical (ICRP)',
  },
  spongyBone: {
    id: 'spongyBone',
    label: 'Spongy bone',
    defaultDensityGPerCm3: 1.18,
    zOverA: mix(0.51478, 0.55, SPONGY_BONE_MASS_FRACTION),
    // Bragg additivity for I: ln I = Σ w_i (Z/A)_i ln I_i / Σ w_i (Z/A)_i.
    meanExcitationEnergyEV: Math.exp(
      (SPONGY_BONE_MASS_FRACTION * 0.51478 * Math.log(112) +
        (1 - SPONGY_BONE_MASS_FRACTION) * 0.55 * Math.log(74.6)) /
        mix(0.51478, 0.55, SPONGY_BONE_MASS_FRACTION),
    ),
    radiationLengthGPerCm2: 1 / mix(1 / 26.99, 1 / 36.81, SPONGY_BONE_MASS_FRACTION),
    coefficients: [
      { table: 'bone', massFraction: SPONGY_BONE_MASS_FRACTION },
      { table: 'muscle', massFraction: 1 - SPONGY_BONE_MASS_FRACTION },
    ],
    stopping: [
      { table: 'boneCorticalICRP', massFraction: SPONGY_BONE_MASS_FRACTION },
      { table: 'softTissueICRP', massFraction: 1 - SPONGY_BONE_MASS_FRACTION },
    ],
    source:
      'Mixture (by mass, 24.3 % cortical bone + 75.7 % muscle, ICRU-44 constituents) giving 1.18 g/cm³; derived, approximate',
  },
  custom: {
    id: 'custom',
    label: 'Custom density (water composition)',
    defaultDensityGPerCm3: 1.0,
    zOverA: 0.55508,
    meanExcitationEnergyEV: 75.0,
    radiationLengthGPerCm2: 36.08,
    coefficients: one('water'),
    stopping: one('water'),
    source: 'Water composition at the density entered by the user',
  },
};

export const WATER_Z_OVER_A = LIBRARY.water.zOverA;

export function getMaterial(id: MaterialId): Material {
  return LIBRARY[id];
}

export function isMaterialId(value: unknown): value is MaterialId {
  return typeof value === 'string' && (MATERIAL_IDS as readonly string[]).includes(value);
}

export function allMaterials(): Material[] {
  return MATERIAL_IDS.map((id) => LIBRARY[id]);
}

/**
 * Relative electron density ρ_e = (ρ/ρ_w)·(Z/A)/(Z/A)_w of a material at a given mass density
 * (ρ_w = 1 g/cm³).
 */
export function relativeElectronDensity(id: MaterialId, densityGPerCm3: number): number {
  return (densityGPerCm3 * LIBRARY[id].zOverA) / WATER_Z_OVER_A;
}
