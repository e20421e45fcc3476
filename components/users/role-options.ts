import { ROLE_LABELS, ROLES, type Role } from '../../shared/schemas/auth';
import type { SegmentOption } from '../ui/segmented-control';

export const ROLE_OPTIONS: readonly SegmentOption<Role>[] = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
