import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import type { JobCreateInput, JobDetail, JobPatchInput } from '../../shared/schemas/jobs';
import { Tag } from '../ui/tag';
import { TextLink } from '../ui/text-link';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { JobForm } from './job-form';

export interface JobHeaderProps {
  job: JobDetail;
  canEdit: boolean;
  onSave: (patch: JobPatchInput) => Promise<unknown>;
}

/** The job's name and customer, with renaming and archiving for editors. */
export function JobHeader({ job, canEdit, onSave }: JobHeaderProps) {
  const [editing, setEditing] = useState(false);
  const [statusError, setStatusError] = useState<string>();
  const [switching, setSwitching] = useState(false);
  const archived = job.status === 'archived';

  const toggleArchive = async () => {
    setStatusError(undefined);
    setSwitching(true);
    try {
      await onSave({ status: archived ? 'active' : 'archived' });
    } catch (error) {
      setStatusError(messageOf(error));
    } finally {
      setSwitching(false);
    }
  };

  if (editing) {
    const values: JobCreateInput = { name: job.name, customer: job.customer, application: job.application, notes: job.notes };
    return (
      <Card>
        <Text variant="heading" headingLevel={1}>
          Edit job details
        </Text>
        <JobForm
          defaultValues={values}
          submitLabel="Save job details"
          onCancel={() => setEditing(false)}
          onSubmit={async (v) => {
            await onSave(v);
            setEditing(false);
          }}
        />
      </Card>
    );
  }

  return (
    <View style={styles.header}>
      <TextLink href="/jobs" label="← Jobs" accessibilityLabel="Back to the jobs" />
      <View style={styles.titleRow}>
        <Text variant="title" headingLevel={1}>
          {job.name}
        </Text>
        {archived ? <Tag label="archived" /> : null}
      </View>
      <Text tone="muted">
        {job.customer} · {job.application}
      </Text>
      {job.notes ? <Text>{job.notes}</Text> : null}
      {archived ? <Text tone="warning">This job is archived: unarchive it to change its runs.</Text> : null}
      {statusError ? <ErrorBanner title="The job was not changed" message={statusError} /> : null}
      <View style={styles.actions}>
        <TextLink href={`/jobs/${job.id}/sheet`} label="Job sheet" accessibilityLabel="Open the job sheet" />
        {canEdit ? (
          <>
            <Button label="Edit job details" variant="secondary" compact onPress={() => setEditing(true)} />
            <Button
              label={archived ? 'Unarchive job' : 'Archive job'}
              variant="ghost"
              compact
              loading={switching}
              onPress={() => void toggleArchive()}
            />
          </>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
