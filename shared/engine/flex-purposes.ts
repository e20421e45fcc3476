import type { FlexPurpose } from './types';

export const FLEX_PURPOSES = ['thermal_bellows', 'vibration_decoupler', 'braided_hose'] as const satisfies readonly FlexPurpose[];
