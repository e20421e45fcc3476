import { Redirect, Slot, useLocalSearchParams } from 'expo-router';
import { useEffect } from 'react';
import { Platform } from 'react-native';
import { safeNext } from '../../components/auth/next-path';
import { LoadingState } from '../../components/ui/loading-state';
import { useSessionQuery } from '../../hooks/use-session';

/** Screens for people who are not signed in; a signed-in person goes to the link they opened, or home. */
export default function AuthLayout() {
  const session = useSessionQuery();
  const { next } = useLocalSearchParams<{ next?: string }>();
  const target = safeNext(next);
  // On the web a deep link is opened as a fresh page load: a client-side replace into a screen nested in
  // the signed-in tabs, whose navigators are not mounted yet, can land on the tab's first screen instead.
  const loadPage = Platform.OS === 'web' && Boolean(session.data) && target !== '/';
  useEffect(() => {
    if (loadPage) window.location.replace(String(target));
  }, [loadPage, target]);
  if (session.isPending || loadPage) return <LoadingState label={loadPage ? 'Opening the link…' : 'Checking your session…'} />;
  if (session.data) return <Redirect href={target} />;
  return <Slot />;
}
