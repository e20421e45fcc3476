import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import type { CsvImport, ImportJobView, ImportReport } from '../../hooks/use-alloys';
import { readPickedText } from '../../hooks/use-upload';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { DownloadLink } from './download-link';
import { UploadProgress } from './upload-progress';

export interface CsvToolsProps {
  exportHref: string;
  /** Starts an import and follows it (`useCsvImport`). */
  importer: Pick<CsvImport, 'start' | 'uploadFraction' | 'job' | 'failure' | 'busy'>;
}

const PHASE_TEXT: Record<ImportJobView['phase'], string> = {
  reading: 'Reading the file…',
  checking: 'Checking every row…',
  writing: 'Writing drafts…',
  done: 'Import finished.',
  failed: 'The import stopped.',
};

/** Export the catalogue as CSV, and import one back: good rows become drafts, bad rows are listed by line. */
export function CsvTools({ exportHref, importer }: CsvToolsProps) {
  const [readFailure, setReadFailure] = useState<string>();
  const [fileName, setFileName] = useState<string>();
  const { job, uploadFraction, failure, busy } = importer;

  async function pickAndImport() {
    setReadFailure(undefined);
    const picked = await DocumentPicker.getDocumentAsync({ type: ['text/csv', '.csv', 'text/plain'], base64: false });
    if (picked.canceled || !picked.assets?.[0]) return;
    const asset = picked.assets[0];
    setFileName(asset.name);
    try {
      await importer.start(await readPickedText(asset));
    } catch (error) {
      setReadFailure(messageOf(error));
    }
  }

  const running = job && job.phase !== 'done' && job.phase !== 'failed';
  return (
    <Card>
      <Text variant="heading" headingLevel={2}>
        Catalogue as CSV
      </Text>
      <Text tone="muted">
        One row per property point. Imported alloys become drafts for an admin to publish; rows that do not check out are
        listed with their line. A file may be up to 8 MB. Its figures are in SI (°C, µm/m·K, GPa, MPa, kg/m³) whatever units you read in,
        and the report quotes them as the file has them.
      </Text>
      <View style={styles.actions}>
        <DownloadLink href={exportHref} label="Export CSV" accessibilityLabel="Export the catalogue as CSV" />
        <Button label="Import CSV" variant="secondary" compact loading={busy} disabled={busy} onPress={() => void pickAndImport()} />
      </View>
      {uploadFraction !== undefined ? <UploadProgress fraction={uploadFraction} label="CSV upload progress" /> : null}
      {running ? (
        <View style={styles.report}>
          <Text>{PHASE_TEXT[job.phase]}</Text>
          <UploadProgress fraction={job.fraction} label="Import progress" />
        </View>
      ) : null}
      {readFailure || failure ? <ErrorBanner title="The import did not run" message={readFailure ?? messageOf(failure)} /> : null}
      {job?.phase === 'failed' ? <ErrorBanner title="The import stopped" message={job.error ?? PHASE_TEXT.failed} /> : null}
      {job?.report ? <ImportReportView report={job.report} fileName={fileName} /> : null}
    </Card>
  );
}

const SHOWN = 200;

export function ImportReportView({ report, fileName }: { report: ImportReport; fileName?: string }) {
  const list = (uns: string[]) =>
    uns.length === 0 ? '' : `: ${uns.slice(0, SHOWN).join(', ')}${uns.length > SHOWN ? ` and ${uns.length - SHOWN} more` : ''}`;
  return (
    <View style={styles.report} accessible accessibilityRole="summary" aria-live="polite" aria-label="Import report">
      <Text variant="bodyStrong">Import report{fileName ? ` for ${fileName}` : ''}</Text>
      <Text>
        Created {report.created.length}
        {list(report.created)}
      </Text>
      <Text>
        Updated {report.updated.length}
        {list(report.updated)}
      </Text>
      <Text>
        Unchanged {report.unchanged.length}
        {list(report.unchanged)}
      </Text>
      <Text tone={report.refused.length > 0 ? 'danger' : 'default'}>Refused rows {report.refused.length}</Text>
      {report.refused.slice(0, SHOWN).map((r, i) => (
        <Text key={`${r.line}-${i}`} variant="caption" tone="danger">
          Line {r.line}
          {r.uns ? ` (${r.uns})` : ''}: {r.message}
        </Text>
      ))}
      {report.refused.length > SHOWN ? <Text variant="caption">…and {report.refused.length - SHOWN} more refused rows.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.lg },
  report: { gap: spacing.xs },
});
