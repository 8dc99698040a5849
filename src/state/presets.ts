// Starting phantoms. Invented teaching scenarios, not patient geometries: thicknesses are round
// numbers chosen to show one effect each.
import { CASE_FORMAT, CASE_VERSION, type CaseLayer, type LaminaCase } from '../io/caseSchema';

export interface Preset {
  id: string;
  label: string;
  description: string;
  make(): LaminaCase;
}

function slabCase(name: string, layers: CaseLayer[], points: LaminaCase['points']): LaminaCase {
  return {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    name,
    beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
    layers,
    points,
  };
}

export const PRESETS: readonly Preset[] = [
  {
    id: 'chest',
    label: 'Chest wall, lung, mediastinum',
    description: '3 cm soft tissue over 8 cm lung over 9 cm soft tissue',
    make: () =>
      slabCase(
        'Chest wall over lung over mediastinum',
        [
          { materialId: 'softTissue', thicknessCm: 3, label: 'chest wall' },
          { materialId: 'lung', thicknessCm: 8, label: 'lung' },
          { materialId: 'softTissue', thicknessCm: 9, label: 'mediastinum' },
        ],
        [
          { id: 'P1', depthCm: 15 },
          { id: 'in-lung', depthCm: 7 },
        ],
      ),
  },
  {
    id: 'rib',
    label: 'Rib over lung',
    description: '1.5 cm soft tissue, 1 cm cortical bone, 10 cm lung, 7.5 cm soft tissue',
    make: () =>
      slabCase(
        'Rib over lung',
        [
          { materialId: 'softTissue', thicknessCm: 1.5, label: 'skin and fat' },
          { materialId: 'corticalBone', thicknessCm: 1, label: 'rib' },
          { materialId: 'lung', thicknessCm: 10, label: 'lung' },
          { materialId: 'softTissue', thicknessCm: 7.5, label: 'mediastinum' },
        ],
        [
          { id: 'lung-entry', depthCm: 3.5 },
          { id: 'P1', depthCm: 14 },
        ],
      ),
  },
  {
    id: 'sinus',
    label: 'Sinus air cavity',
    description: '2 cm soft tissue, 3 cm air, 10 cm soft tissue',
    make: () =>
      slabCase(
        'Sinus air cavity',
        [
          { materialId: 'softTissue', thicknessCm: 2, label: 'face' },
          { materialId: 'air', thicknessCm: 3, label: 'air cavity' },
          { materialId: 'softTissue', thicknessCm: 10, label: 'tissue beyond' },
        ],
        [
          { id: 'past-cavity', depthCm: 5.5 },
          { id: 'P1', depthCm: 9 },
        ],
      ),
  },
  {
    id: 'bone',
    label: 'Bone slab',
    description: '3 cm water, 2 cm cortical bone, 15 cm water',
    make: () =>
      slabCase(
        'Bone slab in water',
        [
          { materialId: 'water', thicknessCm: 3 },
          { materialId: 'corticalBone', thicknessCm: 2, label: 'bone' },
          { materialId: 'water', thicknessCm: 15 },
        ],
        [
          { id: 'below-bone', depthCm: 5.5 },
          { id: 'P1', depthCm: 10 },
        ],
      ),
  },
  {
    id: 'water',
    label: 'Homogeneous water',
    description: '25 cm water',
    make: () =>
      slabCase(
        'Homogeneous water',
        [{ materialId: 'water', thicknessCm: 25 }],
        [{ id: 'P1', depthCm: 10 }],
      ),
  },
];

export function presetById(id: string): Preset | undefined {
  return PRESETS.find((p) => p.id === id);
}
