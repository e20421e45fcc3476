import type { PublicUser, Role } from '../../shared/schemas/auth';

/** Roles that change jobs and runs; sales reads them to quote. The server enforces this on every route. */
export const JOB_EDITORS: readonly Role[] = ['fabricator', 'engineer', 'admin'];

export const canEditJobs = (me: PublicUser | null | undefined) => Boolean(me && JOB_EDITORS.includes(me.role));
