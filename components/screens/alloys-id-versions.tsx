import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { useScreenTitle } from '../ui/use-screen-title';
import { AlloyCharts } from '../alloys/alloy-charts';
import { AlloyProperties } from '../alloys/alloy-properties';
import { indexSources, SourceList } from '../alloys/source-citation';
import { VersionList } from '../alloys/version-list';
import { CautionsNote } from '../ui/cautions-note';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Section } from '../ui/section';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { messageOf } from '../../hooks/api-client';
import { useAlloyVersionQuery, useAlloyVersionsQuery } from '../../hooks/use-alloys';
import { useUnits } from '../../hooks/use-units';
import { useSourcesQuery } from '../../hooks/use-sources';
import type { AlloyVersionView, SourceView } from '../../shared/schemas/alloy';

const STATE_WORDS = { published: 'published, in use now', superseded: 'superseded', draft: 'draft, not published' } as const;

/** An alloy's past versions, each readable as it stood: properties, charts and sources. */
export default function AlloyVersionsScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const versions = useAlloyVersionsQuery(id);
  const [chosen, setChosen] = useState<number>();
  const shownNumber = chosen ?? versions.data?.find((v) => v.state === 'published')?.version ?? versions.data?.[0]?.version;
  const version = useAlloyVersionQuery(id, shownNumber);
  useScreenTitle(shownNumber === undefined ? 'Past versions' : `Version ${shownNumber}`, version.data?.designation, 'Alloy catalogue');
  const sources = useSourcesQuery();
  const back = <TextLink href={`/alloys/${id}`} label="← Back to the alloy" accessibilityLabel="Back to the alloy" />;

  if (versions.isPending) return <LoadingState label="Loading the versions…" />;
  if (versions.isError) {
    return (
      <Screen>
        {back}
        <ErrorBanner title="The versions did not load" message={messageOf(versions.error)} onRetry={() => void versions.refetch()} />
      </Screen>
    );
  }
  const summary = versions.data.find((v) => v.version === shownNumber);
  return (
    <Screen wide>
      {back}
      <Text variant="title" headingLevel={1}>
        Versions of {versions.data[0]?.designation ?? 'this alloy'}
      </Text>
      <Text tone="muted">Every published version stays readable: jobs and quotes made earlier can be checked against the data they used.</Text>
      <VersionList versions={versions.data} chosen={shownNumber} onChoose={setChosen} />
      {version.isPending ? (
        <LoadingState label="Loading the version…" />
      ) : version.isError ? (
        <ErrorBanner title="The version did not load" message={messageOf(version.error)} onRetry={() => void version.refetch()} />
      ) : (
        <>
          <Text variant="heading" headingLevel={2}>
            Version {version.data.version}
            {summary ? ` (${STATE_WORDS[summary.state]})` : ''}
          </Text>
          <VersionBody version={version.data} sources={sources.data ?? []} />
        </>
      )}
    </Screen>
  );
}

function VersionBody({ version, sources }: { version: AlloyVersionView; sources: SourceView[] }) {
  const units = useUnits();
  const index = indexSources(
    [version.densitySourceId, version.limitsSourceId, ...[...version.cte, ...version.modulus, ...version.yield].map((p) => p.sourceId)],
    sources,
  );
  return (
    <>
      <Section title="Properties">
        <AlloyProperties version={version} index={index} units={units} />
      </Section>
      <Section title="Expansion">
        <AlloyCharts version={version} units={units} />
        <CautionsNote />
      </Section>
      <Section title="Sources">
        <SourceList index={index} />
      </Section>
    </>
  );
}
