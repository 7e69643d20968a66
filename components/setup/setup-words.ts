import type { SetupKind } from '@/shared/schemas/setup';

export const setupKindWords: Record<SetupKind, string> = {
  seat_wedge: 'Seat wedge',
  chin_rest: 'Chin rest fit',
  shoulder_rest: 'Shoulder rest fit',
  thumb_rest: 'Thumb-rest position',
  strap: 'Strap or support',
  stand_height: 'Stand height',
  custom: 'Other',
};
