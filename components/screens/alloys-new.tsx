import { useRouter } from 'expo-router';
import { useState } from 'react';
import { AlloyForm } from '../alloys/alloy-form';
import { emptyAlloy } from '../alloys/alloy-form-values';
import { EDITORS, RoleGate } from '../alloys/role-gate';
import { TextLink } from '../ui/text-link';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { messageOf } from '../../hooks/api-client';
import { useCreateAlloyMutation } from '../../hooks/use-alloys';
import { useUnits } from '../../hooks/use-units';
import { useCreateSourceMutation, useSourcesQuery } from '../../hooks/use-sources';
import { useScreenTitle } from '../ui/use-screen-title';

export default function NewAlloyScreen() {
  useScreenTitle('New alloy', 'Alloy catalogue');
  return (
    <RoleGate roles={EDITORS} title="Only engineers and admins add alloys">
      <NewAlloy />
    </RoleGate>
  );
}

function NewAlloy() {
  const router = useRouter();
  const sources = useSourcesQuery();
  const units = useUnits();
  const createSource = useCreateSourceMutation();
  const create = useCreateAlloyMutation();
  const [defaults] = useState(emptyAlloy);

  return (
    <Screen>
      <TextLink href="/alloys" label="← Catalogue" accessibilityLabel="Back to the catalogue" />
      <Text variant="title" headingLevel={1}>
        New alloy
      </Text>
      <Text tone="muted">It is saved as a draft; an admin publishes it before the shop works from it.</Text>
      {sources.isPending ? (
        <LoadingState label="Loading sources…" />
      ) : sources.isError ? (
        <ErrorBanner title="The sources did not load" message={messageOf(sources.error)} onRetry={() => void sources.refetch()} />
      ) : (
        <AlloyForm
          defaultValues={defaults}
          sources={sources.data}
          onCreateSource={(input) => createSource.mutateAsync(input)}
          submitLabel="Save draft"
          units={units}
          onSubmit={async (values, note) => {
            const alloy = await create.mutateAsync({ ...values, note });
            router.replace(`/alloys/${alloy.id}`);
          }}
        />
      )}
    </Screen>
  );
}
