import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { TextLink } from '../ui/text-link';
import { LoadFailed } from '../jobs/load-failed';
import { JobDepositNote } from '../jobs/job-deposit-note';
import { JobSheet } from '../jobs/job-sheet';
import { canPrint, printPage, PrintStyle } from '../jobs/print-style';
import { Button } from '../ui/button';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { spacing } from '../../constants/theme';
import { useJobQuery } from '../../hooks/use-jobs';
import { useUnits } from '../../hooks/use-units';
import { useScreenTitle } from '../ui/use-screen-title';

export default function JobSheetScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const units = useUnits();
  const job = useJobQuery(id);

  useScreenTitle('Job sheet', job.data?.name);
  if (job.isPending || job.settling) return <LoadingState label="Loading the job sheet…" />;
  if (job.isError) {
    return <LoadFailed title="The job sheet did not load" error={job.error} onRetry={() => void job.refetch()} backHref="/jobs" backLabel="Back to the jobs" />;
  }

  return (
    <Screen>
      <PrintStyle />
      <View nativeID="print-hide-actions" style={styles.actions}>
        <TextLink href={`/jobs/${job.data.id}`} label={`← ${job.data.name}`} accessibilityLabel={`Back to ${job.data.name}`} />
        {canPrint ? <Button label="Print" accessibilityLabel="Print the job sheet" onPress={printPage} /> : null}
      </View>
      <View nativeID="job-sheet">
        <JobDepositNote jobId={job.data.id} />
        <JobSheet job={job.data} units={units} />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
});
