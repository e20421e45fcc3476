import { Redirect, Slot } from 'expo-router';
import { LoadingState } from '../../components/ui/loading-state';
import { useSessionQuery } from '../../hooks/use-session';

/** Screens for people who are not signed in; a signed-in person goes straight home. */
export default function AuthLayout() {
  const session = useSessionQuery();
  if (session.isPending) return <LoadingState label="Checking your session…" />;
  if (session.data) return <Redirect href="/" />;
  return <Slot />;
}
