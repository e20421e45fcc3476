import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import type { ImportReport } from '../../hooks/use-alloys';
import { readPickedText } from '../../hooks/use-upload';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { DownloadLink } from './download-link';

export interface CsvToolsProps {
  exportHref: string;
  /** Sends the CSV text; resolves with the server's report. */
  onImport: (csvText: string) => Promise<ImportReport>;
}

/** Export the catalogue as CSV, and import one back: good rows become drafts, bad rows are listed by line. */
export function CsvTools({ exportHref, onImport }: CsvToolsProps) {
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string>();
  const [report, setReport] = useState<ImportReport>();
  const [fileName, setFileName] = useState<string>();

  async function pickAndImport() {
    setFailure(undefined);
    const picked = await DocumentPicker.getDocumentAsync({ type: ['text/csv', '.csv', 'text/plain'], base64: false });
    if (picked.canceled || !picked.assets?.[0]) return;
    const asset = picked.assets[0];
    setBusy(true);
    setReport(undefined);
    setFileName(asset.name);
    try {
      setReport(await onImport(await readPickedText(asset)));
    } catch (error) {
      setFailure(messageOf(error));
    } finally {
      setBusy(false);
    }
  }

  return (
    <Card>
      <Text variant="heading" headingLevel={2}>
        Catalogue as CSV
      </Text>
      <Text tone="muted">
        One row per property point. Imported alloys become drafts for an admin to publish; rows that do not check out are
        listed with their line.
      </Text>
      <View style={styles.actions}>
        <DownloadLink href={exportHref} label="Export CSV" accessibilityLabel="Export the catalogue as CSV" />
        <Button label="Import CSV" variant="secondary" compact loading={busy} onPress={() => void pickAndImport()} />
      </View>
      {failure ? <ErrorBanner title="The import did not run" message={failure} /> : null}
      {report ? <ImportReportView report={report} fileName={fileName} /> : null}
    </Card>
  );
}

export function ImportReportView({ report, fileName }: { report: ImportReport; fileName?: string }) {
  const list = (uns: string[]) => (uns.length > 0 ? `: ${uns.join(', ')}` : '');
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
      {report.refused.map((r, i) => (
        <Text key={`${r.line}-${i}`} variant="caption" tone="danger">
          Line {r.line}
          {r.uns ? ` (${r.uns})` : ''}: {r.message}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.lg },
  report: { gap: spacing.xs },
});
