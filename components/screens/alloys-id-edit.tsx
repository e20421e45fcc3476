import { useLocalSearchParams, useRouter } from 'expo-router';
import { AlloyForm } from '../alloys/alloy-form';
import { toFormValues } from '../alloys/alloy-form-values';
import { EDITORS, RoleGate } from '../alloys/role-gate';
import { TextLink } from '../ui/text-link';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { messageOf } from '../../hooks/api-client';
import { useAlloyQuery, useUpdateAlloyMutation } from '../../hooks/use-alloys';
import { useUnits } from '../../hooks/use-units';
import { useCreateSourceMutation, useSourcesQuery } from '../../hooks/use-sources';
import { useScreenTitle } from '../ui/use-screen-title';

export default function EditAlloyScreen() {
  useScreenTitle('Edit alloy', 'Alloy catalogue');
  return (
    <RoleGate roles={EDITORS} title="Only engineers and admins edit alloys">
      <EditAlloy />
    </RoleGate>
  );
}

function EditAlloy() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const alloy = useAlloyQuery(id);
  const sources = useSourcesQuery();
  const units = useUnits();
  const createSource = useCreateSourceMutation();
  const update = useUpdateAlloyMutation(id ?? '');

  if (alloy.isPending || sources.isPending) return <LoadingState label="Loading the alloy…" />;
  if (alloy.isError || sources.isError) {
    const error = alloy.error ?? sources.error;
    return (
      <Screen>
        <ErrorBanner
          title="The alloy could not be opened for editing"
          message={messageOf(error)}
          onRetry={() => void (alloy.isError ? alloy.refetch() : sources.refetch())}
        />
      </Screen>
    );
  }

  // Edits go on the open draft; without one, the published version is the starting point.
  const base = alloy.data.draft ?? alloy.data.published!;
  return (
    <Screen>
      <TextLink href={`/alloys/${alloy.data.id}`} label={`← ${base.designation}`} accessibilityLabel={`Back to ${base.designation}`} />
      <Text variant="title" headingLevel={1}>
        Edit {base.designation}
      </Text>
      <Text tone="muted">
        {alloy.data.draft
          ? `You are editing draft version ${alloy.data.draft.version}.`
          : 'Saving opens a draft beside the published version; readers keep the published data until an admin publishes.'}
      </Text>
      <AlloyForm
        key={base.versionId}
        defaultValues={toFormValues(base)}
        sources={sources.data}
        onCreateSource={(input) => createSource.mutateAsync(input)}
        submitLabel="Save draft"
        units={units}
        onSubmit={async (values, note) => {
          await update.mutateAsync({ ...values, note: note || undefined });
          router.replace(`/alloys/${alloy.data.id}`);
        }}
      />
    </Screen>
  );
}
