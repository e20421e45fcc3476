import type { ReactNode } from 'react';
import { useSessionQuery } from '../../hooks/use-session';
import type { Role } from '../../shared/schemas/auth';
import { EmptyState } from '../ui/empty-state';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { TextLink } from '../ui/text-link';

/** Shows the screen only to the roles that may use it; the server refuses the rest regardless. */
export function RoleGate({ roles, title, children }: { roles: readonly Role[]; title: string; children: ReactNode }) {
  const { data: me } = useSessionQuery();
  if (!me) return <LoadingState />;
  if (!roles.includes(me.role)) {
    return (
      <Screen>
        <EmptyState title={title} message="Your role can read the catalogue but not change it." action={<TextLink href="/alloys" label="Back to the catalogue" />} />
      </Screen>
    );
  }
  return <>{children}</>;
}

export const EDITORS = ['engineer', 'admin'] as const;
