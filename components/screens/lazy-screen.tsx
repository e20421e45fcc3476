import { useEffect, useState } from 'react';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import type { ScreenName, screens as Screens } from './all-screens';

/**
 * The signed-in screens live in one chunk behind one dynamic import. Metro puts every module that two
 * route chunks share into a common chunk that every page loads; with the screens behind this import,
 * the sign-in screen and the customer's page load only what they use themselves.
 */
type ScreensModule = { screens: typeof Screens };

let loaded: ScreensModule | null = null;
let loading: Promise<ScreensModule> | null = null;

export function loadScreens(): Promise<ScreensModule> {
  loading ??= import('./all-screens').then(
    (m) => (loaded = m),
    (error: unknown) => {
      loading = null; // a later visit tries again
      throw error;
    },
  );
  return loading;
}

/** A route's default export: renders at once when the chunk is in, otherwise waits for it. */
export function lazyScreen(name: ScreenName) {
  function LazyScreen() {
    const [module, setModule] = useState(loaded);
    const [failed, setFailed] = useState(false);
    const [attempt, setAttempt] = useState(0);
    useEffect(() => {
      if (module) return;
      let live = true;
      loadScreens().then(
        (m) => live && setModule(m),
        () => live && setFailed(true),
      );
      return () => {
        live = false;
      };
    }, [module, attempt]);
    if (module) {
      const Component = module.screens[name];
      return <Component />;
    }
    if (failed) {
      return (
        <Screen>
          <ErrorBanner
            message="This screen could not be loaded. Check the connection and try again."
            onRetry={() => {
              setFailed(false);
              setAttempt((n) => n + 1);
            }}
          />
        </Screen>
      );
    }
    return <LoadingState />;
  }
  LazyScreen.displayName = `LazyScreen(${name})`;
  return LazyScreen;
}
