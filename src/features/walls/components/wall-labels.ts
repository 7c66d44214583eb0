import type { Mounting } from '@shared/schemas/enums';
import { mountings } from '@shared/schemas/enums';

export const mountingLabels: Record<Mounting, string> = {
  ground_stacked: 'Ground-stacked',
  flown: 'Flown',
  wall_fixed: 'Wall-fixed',
  curved: 'Curved',
};

export const mountingOptions = mountings.map((value) => ({ value, label: mountingLabels[value] }));
