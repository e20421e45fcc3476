import { z } from 'zod';

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;
export const unitSystemSchema = z.enum(UNIT_SYSTEMS, { error: 'Choose metric or imperial' });

/** Body of PUT /api/me/preferences and the `preferences` it answers. */
export const preferencesSchema = z.object({ unitSystem: unitSystemSchema });
export type Preferences = z.infer<typeof preferencesSchema>;

export const DEFAULT_PREFERENCES: Preferences = { unitSystem: 'metric' };
