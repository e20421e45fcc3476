import type { PublicUser } from '../../shared/schemas/auth';

/** Who asks or writes: a signed-in person, the seed, or nobody (a public reader). */
export type Actor = (Pick<PublicUser, 'name' | 'role'> & { id: string | null }) | null;

/** Who writes what the seed adds: full rights, no user row. */
export const SEED_ACTOR: Actor = { id: null, name: 'Dilato seed', role: 'admin' };

const EDITORS = new Set(['engineer', 'admin']);
export const canEdit = (actor: Actor) => actor !== null && EDITORS.has(actor.role);
