import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import type { DatasheetView } from '../shared/schemas/alloy';
import { api, ApiError, send } from './api-client';
import { alloyKeys } from './use-alloys';

/** What expo-document-picker hands back; on the web it carries the browser's File. */
export interface PickedFile {
  name: string;
  uri: string;
  mimeType?: string;
  file?: File;
}

/** The text of a picked file (a CSV): the File on the web, else the local URI read as a blob. */
export async function readPickedText(picked: PickedFile): Promise<string> {
  if (picked.file) return picked.file.text();
  try {
    return await (await fetch(picked.uri)).text();
  } catch {
    throw new ApiError('invalid', 'Dilato could not read that file.');
  }
}

function formFor(picked: PickedFile): FormData {
  const form = new FormData();
  if (picked.file) form.append('file', picked.file, picked.name);
  // React Native's FormData takes a { uri, name, type } descriptor for a local file.
  else form.append('file', { uri: picked.uri, name: picked.name, type: picked.mimeType ?? 'application/pdf' } as unknown as Blob);
  return form;
}

/** Upload a data sheet PDF to an alloy, with the share of the file sent so far (0–1, null when idle). */
export function useUploadDatasheetMutation(alloyId: string) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const inFlight = useRef<AbortController | null>(null);
  const mutation = useMutation({
    mutationFn: async (picked: PickedFile) => {
      setProgress(0);
      const controller = new AbortController();
      inFlight.current = controller;
      try {
        const { datasheet } = await send<{ datasheet: DatasheetView }>(
          `/alloys/${encodeURIComponent(alloyId)}/datasheets`,
          formFor(picked),
          { onProgress: setProgress, signal: controller.signal },
        );
        setProgress(1);
        return datasheet;
      } finally {
        inFlight.current = null;
      }
    },
    onError: () => setProgress(null),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: alloyKeys.detail(alloyId) });
      void queryClient.invalidateQueries({ queryKey: alloyKeys.revisions(alloyId) });
    },
  });
  /** Stops the upload in progress; the server keeps nothing of a file it did not receive whole. */
  const cancel = () => inFlight.current?.abort();
  return { ...mutation, progress, cancel };
}

/** Removes a data sheet (engineer, admin); the alloy's history records it. */
export function useRemoveDatasheetMutation(alloyId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (datasheetId: string) => api.delete<{ removed: { id: string } }>(`/datasheets/${encodeURIComponent(datasheetId)}`),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: alloyKeys.detail(alloyId) });
      return queryClient.invalidateQueries({ queryKey: alloyKeys.revisions(alloyId) });
    },
  });
}
