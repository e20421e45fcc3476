import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '../../constants/theme';
import { messageOf, UploadCancelled } from '../../hooks/api-client';
import type { PickedFile } from '../../hooks/use-upload';
import type { DatasheetView } from '../../shared/schemas/alloy';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { DownloadLink } from './download-link';
import { formatBytes, formatWhen } from './format';
import { SuccessNote } from './success-note';
import { UploadProgress } from './upload-progress';

export interface DatasheetSectionProps {
  datasheets: DatasheetView[];
  /** Present for engineers and admins. */
  upload?: {
    onUpload: (file: PickedFile) => Promise<unknown>;
    /** Stops the upload in progress. */
    onCancel: () => void;
    /** 0–1 while a file is on its way or just arrived; null when idle. */
    progress: number | null;
    uploading: boolean;
  };
  /** Present for engineers and admins: removes the sheet (asked once more first). */
  onRemove?: (sheet: DatasheetView) => Promise<unknown>;
}

export function DatasheetSection({ datasheets, upload, onRemove }: DatasheetSectionProps) {
  const [failure, setFailure] = useState<string>();
  const [done, setDone] = useState<string>();

  async function pickAndUpload() {
    if (!upload) return;
    setFailure(undefined);
    setDone(undefined);
    const picked = await DocumentPicker.getDocumentAsync({ type: 'application/pdf', base64: false });
    if (picked.canceled || !picked.assets?.[0]) return;
    const asset = picked.assets[0];
    try {
      await upload.onUpload(asset);
      setDone(`${asset.name} is attached.`);
    } catch (error) {
      if (error instanceof UploadCancelled) setDone(`Upload of ${asset.name} cancelled; nothing was attached.`);
      else setFailure(messageOf(error));
    }
  }

  return (
    <View style={styles.wrapper}>
      {datasheets.length === 0 ? (
        <Text tone="muted">No data sheets attached yet.</Text>
      ) : (
        <View role="list" aria-label="Data sheets" style={styles.list}>
          {datasheets.map((d) => (
            <View key={d.id} role="listitem" style={styles.item}>
              <DownloadLink
                href={`/api/datasheets/${encodeURIComponent(d.id)}`}
                label={d.originalName}
                accessibilityLabel={`Download ${d.originalName}`}
              />
              <Text variant="caption" tone="muted">
                {formatBytes(d.sizeBytes)} · added {formatWhen(d.uploadedAt)}
                {d.uploadedBy ? ` by ${d.uploadedBy}` : ''}
              </Text>
              {onRemove ? <RemoveSheet sheet={d} onRemove={onRemove} onRemoved={setDone} /> : null}
            </View>
          ))}
        </View>
      )}
      {upload ? (
        <View style={styles.upload}>
          <Button
            label="Upload a data sheet (PDF)"
            accessibilityLabel="Upload a data sheet"
            variant="secondary"
            loading={upload.uploading}
            onPress={() => void pickAndUpload()}
          />
          <Text variant="caption" tone="muted">
            PDF only, up to 25 MB.
          </Text>
          {upload.progress !== null ? <UploadProgress fraction={upload.progress} /> : null}
          {upload.uploading ? <Button label="Cancel upload" variant="ghost" compact onPress={upload.onCancel} /> : null}
          {failure ? <ErrorBanner title="The data sheet was not attached" message={failure} /> : null}
          {done ? <SuccessNote message={done} /> : null}
        </View>
      ) : null}
    </View>
  );
}

function RemoveSheet({ sheet, onRemove, onRemoved }: { sheet: DatasheetView; onRemove: (sheet: DatasheetView) => Promise<unknown>; onRemoved: (text: string) => void }) {
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string>();
  async function remove() {
    setBusy(true);
    setFailure(undefined);
    try {
      await onRemove(sheet);
      onRemoved(`${sheet.originalName} is removed.`);
    } catch (error) {
      setFailure(messageOf(error));
      setBusy(false);
    }
  }
  if (!asking) return <Button label="Remove" accessibilityLabel={`Remove ${sheet.originalName}`} variant="ghost" compact onPress={() => setAsking(true)} />;
  return (
    <View role="alertdialog" aria-label={`Remove ${sheet.originalName}?`} style={styles.ask}>
      <Text variant="bodyStrong">Remove {sheet.originalName}? The file is deleted; the history keeps a note of it.</Text>
      <View style={styles.buttons}>
        <Button label="Yes, remove it" variant="danger" compact loading={busy} onPress={() => void remove()} />
        <Button label="Keep it" variant="ghost" compact disabled={busy} onPress={() => setAsking(false)} />
      </View>
      {failure ? <ErrorBanner title="The data sheet was not removed" message={failure} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  ask: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  wrapper: { gap: spacing.md },
  list: { gap: spacing.xs },
  item: { borderBottomWidth: 1, borderBottomColor: colors.border, paddingBottom: spacing.xs },
  upload: { gap: spacing.sm },
});
