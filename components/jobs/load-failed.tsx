import type { Href } from 'expo-router';
import { messageOf } from '../../hooks/api-client';
import { TextLink } from '../ui/text-link';
import { ErrorBanner } from '../ui/error-banner';
import { Screen } from '../ui/screen';

/** A job, run or sheet that did not load: what went wrong, a retry, and the way back. */
export function LoadFailed({ title, error, onRetry, backHref, backLabel }: { title: string; error: unknown; onRetry: () => void; backHref: Href; backLabel: string }) {
  return (
    <Screen>
      <ErrorBanner title={title} message={messageOf(error)} onRetry={onRetry} />
      <TextLink href={backHref} label={backLabel} />
    </Screen>
  );
}
