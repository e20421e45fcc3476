import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AlloyCharts } from '../alloys/alloy-charts';
import { AlloyHeader } from '../alloys/alloy-header';
import { AlloyProperties } from '../alloys/alloy-properties';
import { CautionsNote } from '../ui/cautions-note';
import { DatasheetSection } from '../alloys/datasheet-section';
import { DiffList } from '../alloys/diff-list';
import { sourceMap } from '../alloys/diff-text';
import { useUnits } from '../../hooks/use-units';
import { RevisionHistory } from '../alloys/revision-history';
import { Section } from '../ui/section';
import { indexSources, SourceList } from '../alloys/source-citation';
import { StatusActions } from '../alloys/status-actions';
import { TextLink } from '../ui/text-link';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { draftChanges } from '../../shared/catalogue/alloy-diff';
import { useAlloyQuery, useAlloyRevisionsQuery, useAlloyStatusMutation, useReviewStepMutation } from '../../hooks/use-alloys';
import { SubmitForReview } from '../alloys/review-step-forms';
import { useSessionQuery } from '../../hooks/use-session';
import { useSourcesQuery } from '../../hooks/use-sources';
import { useScreenTitle } from '../ui/use-screen-title';
import { useRemoveDatasheetMutation, useUploadDatasheetMutation } from '../../hooks/use-upload';

type Shown = 'published' | 'draft';

export default function AlloyDetailScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const { data: me } = useSessionQuery();
  const canEdit = me?.role === 'engineer' || me?.role === 'admin';
  const isAdmin = me?.role === 'admin';
  const units = useUnits();
  const alloy = useAlloyQuery(id);
  const revisions = useAlloyRevisionsQuery(id);
  const upload = useUploadDatasheetMutation(id ?? '');
  const status = useAlloyStatusMutation(id ?? '');
  const reviewStep = useReviewStepMutation(id ?? '');
  const removeSheet = useRemoveDatasheetMutation(id ?? '');
  const allSources = useSourcesQuery();
  const [choice, setChoice] = useState<Shown>('published');

  useScreenTitle(alloy.data ? `${alloy.data.published?.designation ?? alloy.data.draft?.designation ?? 'Alloy'}` : 'Alloy', 'Alloy catalogue');
  if (alloy.isPending) return <LoadingState label="Loading the alloy…" />;
  if (alloy.isError) {
    return (
      <Screen>
        <ErrorBanner title="The alloy did not load" message={messageOf(alloy.error)} onRetry={() => void alloy.refetch()} />
        <TextLink href="/alloys" label="Back to the catalogue" />
      </Screen>
    );
  }

  const detail = alloy.data;
  const showing: Shown = detail.published && (choice === 'published' || !detail.draft) ? 'published' : 'draft';
  const version = (showing === 'published' ? detail.published : detail.draft)!;
  const index = indexSources(
    [version.densitySourceId, version.limitsSourceId, ...[...version.cte, ...version.modulus, ...version.yield].map((p) => p.sourceId)],
    detail.sources,
  );
  // The history may name sources that no version on this page cites any more.
  const sources = sourceMap([...(allSources.data ?? []), ...detail.sources]);

  return (
    <Screen wide>
      <TextLink href="/alloys" label="← Catalogue" accessibilityLabel="Back to the catalogue" />
      <AlloyHeader alloy={detail} shown={version} />

      {canEdit && detail.draft ? (
        <Card edge="accent">
          <Text variant="heading" headingLevel={2}>
            Draft version {detail.draft.version}
          </Text>
          <Text tone="muted">
            {detail.published
              ? 'Not published yet: everyone else still works from the published data.'
              : 'This alloy has never been published; only engineers and admins can see it.'}
          </Text>
          {detail.published ? <DiffList diff={draftChanges(detail.published, detail.draft)} sources={sources} units={units} label="Draft changes" /> : null}
          <SubmitForReview review={detail.review} onSubmit={(note) => reviewStep.mutateAsync({ action: 'submit', note })} />
          <View style={styles.links}>
            <TextLink href={`/alloys/${detail.id}/edit`} label="Edit draft" />
            {isAdmin ? <TextLink href={`/alloys/${detail.id}/review`} label="Review and publish" /> : null}
          </View>
        </Card>
      ) : canEdit ? (
        <TextLink href={`/alloys/${detail.id}/edit`} label="Edit this alloy" />
      ) : null}

      {canEdit && detail.published && detail.draft ? (
        <SegmentedControl
          label="Showing"
          options={[
            { value: 'published', label: `Published version ${detail.published.version}` },
            { value: 'draft', label: `Draft version ${detail.draft.version}` },
          ]}
          value={showing}
          onChange={setChoice}
        />
      ) : null}

      <Section title="Properties">
        <AlloyProperties version={version} index={index} units={units} />
      </Section>

      <Section title="Expansion">
        <AlloyCharts version={version} units={units} />
        <CautionsNote />
      </Section>

      <Section title="Sources" intro="Where each value above comes from. Check the supplier’s certified data before relying on it.">
        <SourceList index={index} />
      </Section>

      <Section title="Data sheets">
        <DatasheetSection
          datasheets={detail.datasheets}
          upload={
            canEdit
              ? { onUpload: (file) => upload.mutateAsync(file), onCancel: upload.cancel, progress: upload.progress, uploading: upload.isPending }
              : undefined
          }
          onRemove={canEdit ? (sheet) => removeSheet.mutateAsync(sheet.id) : undefined}
        />
      </Section>

      {isAdmin ? (
        <Section title="Publishing" intro="Publishing makes the draft the data everyone works from; retiring takes the alloy off the list.">
          <StatusActions
            status={detail.status}
            hasDraft={Boolean(detail.draft)}
            hasPublished={Boolean(detail.published)}
            publishQuestion={detail.draft ? `Publish draft version ${detail.draft.version} of ${detail.draft.designation}?` : undefined}
            onAction={(action, note) => status.mutateAsync({ action, note })}
          />
        </Section>
      ) : null}

      <Section title="Revision history">
        {detail.published && detail.published.version > 1 ? <TextLink href={`/alloys/${detail.id}/versions`} label="Browse past versions" /> : null}
        {revisions.isPending ? (
          <LoadingState label="Loading the history…" />
        ) : revisions.isError ? (
          <ErrorBanner message={messageOf(revisions.error)} onRetry={() => void revisions.refetch()} />
        ) : (
          <RevisionHistory revisions={revisions.data} sources={sources} units={units} />
        )}
      </Section>
    </Screen>
  );
}

const styles = StyleSheet.create({
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xl },
});
