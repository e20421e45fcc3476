import { Redirect, Slot, useLocalSearchParams } from 'expo-router';
import { safeNext } from '../../components/auth/next-path';
import { LoadingState } from '../../components/ui/loading-state';
import { useSessionQuery } from '../../hooks/use-session';

/** Screens for people who are not signed in; a signed-in person goes to the link they opened, or home. */
export default function AuthLayout() {
  const session = useSessionQuery();
  const { next } = useLocalSearchParams<{ next?: string }>();
  if (session.isPending) return <LoadingState label="Checking your session…" />;
  if (session.data) return <Redirect href={safeNext(next)} />;
  return <Slot />;
}
