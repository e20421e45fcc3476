import { useLocalSearchParams, useRouter } from 'expo-router';
import { DiffList } from '../alloys/diff-list';
import { sourceMap } from '../alloys/diff-text';
import { RoleGate } from '../alloys/role-gate';
import { StatusActions } from '../alloys/status-actions';
import { TextLink } from '../ui/text-link';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { isApiError, messageOf } from '../../hooks/api-client';
import { useAlloyReviewQuery, useAlloyStatusMutation, useReviewStepMutation } from '../../hooks/use-alloys';
import { SendBackForm } from '../alloys/review-step-forms';
import { useState } from 'react';
import { useScreenTitle } from '../ui/use-screen-title';
import { useUnits } from '../../hooks/use-units';
import { useSourcesQuery } from '../../hooks/use-sources';

export default function ReviewAlloyScreen() {
  useScreenTitle('Review the draft', 'Alloy catalogue');
  return (
    <RoleGate roles={['admin']} title="Only an admin publishes catalogue changes">
      <ReviewAlloy />
    </RoleGate>
  );
}

function ReviewAlloy() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  // Stopped once publishing starts: the draft is gone afterwards and asking for it again would answer 409.
  const [publishing, setPublishing] = useState(false);
  const review = useAlloyReviewQuery(id, !publishing);
  const sources = useSourcesQuery();
  const units = useUnits();
  const status = useAlloyStatusMutation(id ?? '');
  const reviewStep = useReviewStepMutation(id ?? '');
  const back = <TextLink href={`/alloys/${id}`} label="← Back to the alloy" accessibilityLabel="Back to the alloy" />;

  if (review.isPending) return <LoadingState label="Loading the draft…" />;
  if (review.isError) {
    return (
      <Screen>
        {back}
        {isApiError(review.error) && review.error.code === 'no_draft' ? (
          <EmptyState title="Nothing to review" message="This alloy has no open draft: everything is published." />
        ) : (
          <ErrorBanner title="The draft did not load" message={messageOf(review.error)} onRetry={() => void review.refetch()} />
        )}
      </Screen>
    );
  }

  const { draft, published, diff } = review.data;
  return (
    <Screen>
      {back}
      <Text variant="title" headingLevel={1}>
        Review {draft.designation}
      </Text>
      <Text tone="muted">
        {published
          ? `Draft version ${draft.version} against published version ${published.version}.`
          : `Draft version ${draft.version} of a new alloy: everything below is new.`}
      </Text>
      <Card>
        <Text variant="heading" headingLevel={2}>
          {diff.length === 1 ? '1 change' : `${diff.length} changes`}
        </Text>
        <DiffList diff={diff} sources={sourceMap(sources.data)} units={units} label="Changes to publish" />
      </Card>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Publish
        </Text>
        <Text tone="muted">Once published, quotes and jobs use version {draft.version}; the old version stays readable.</Text>
        <StatusActions
          status="draft"
          hasDraft
          hasPublished={Boolean(published)}
          only={['publish']}
          publishQuestion={`Publish draft version ${draft.version} of ${draft.designation}?`}
          onAction={async (action, note) => {
            setPublishing(true);
            try {
              await status.mutateAsync({ action, note });
            } catch (error) {
              setPublishing(false);
              throw error;
            }
            router.replace(`/alloys/${id}`);
          }}
        />
      </Card>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Send back
        </Text>
        <Text tone="muted">Not ready? Send the draft back to the engineer with a note saying what to change. It stays a draft.</Text>
        <SendBackForm
          onSendBack={async (note) => {
            await reviewStep.mutateAsync({ action: 'send-back', note });
            router.replace(`/alloys/${id}`);
          }}
        />
      </Card>
    </Screen>
  );
}
