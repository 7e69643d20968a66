import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import * as DocumentPicker from 'expo-document-picker';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useUploadDocumentMutation } from '@/hooks/use-documents';
import { applyServerErrors } from '@/lib/form-errors';
import { DOCUMENT_TYPES, DocumentUploadFieldsSchema, MAX_DOCUMENT_BYTES, type DocumentUploadFields } from '@/shared/schemas/document';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';

type Values = z.input<typeof DocumentUploadFieldsSchema>;
const empty: Values = { title: '', visibility: 'private' };
const visibilities = [
  { value: 'private', label: 'Private to me', testID: 'document-visibility-private' },
  { value: 'shared', label: 'Shared with musician', testID: 'document-visibility-shared' },
] as const;

/** Attach a letter, handout or photo (PDF, PNG, JPEG, WebP; up to 10 MB) to the record. */
export function UploadForm({ id }: { id: string }) {
  const upload = useUploadDocumentMutation(id);
  const [file, setFile] = useState<File | null>(null);
  const [notice, setNotice] = useState<{ tone: 'success' | 'danger'; text: string } | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<Values, unknown, DocumentUploadFields>({
    resolver: zodResolver(DocumentUploadFieldsSchema),
    defaultValues: empty,
  });
  const { field: visibility } = useController({ control, name: 'visibility' });

  const choose = async () => {
    setNotice(null);
    const picked = await DocumentPicker.getDocumentAsync({ type: [...DOCUMENT_TYPES], multiple: false });
    const chosen = picked.canceled ? null : (picked.assets[0]?.file ?? null);
    if (!picked.canceled && !chosen) setNotice({ tone: 'danger', text: 'Uploading works in the web app; open Ritorno in a browser to attach files.' });
    setFile(chosen);
  };

  const submit = handleSubmit(async (values) => {
    setNotice(null);
    if (!file) return setNotice({ tone: 'danger', text: 'Choose a file first.' });
    if (file.size > MAX_DOCUMENT_BYTES) return setNotice({ tone: 'danger', text: 'The file is larger than 10 MB. Nothing was sent; reduce it and try again.' });
    const form = new FormData();
    form.append('title', values.title);
    form.append('visibility', values.visibility);
    form.append('file', file, file.name);
    try {
      const saved = await upload.mutateAsync(form);
      reset(empty);
      setFile(null);
      setNotice({ tone: 'success', text: `“${saved.title}” attached (${saved.visibility === 'shared' ? 'the musician can open it' : 'private to you'}).` });
    } catch (error) {
      const text = applyServerErrors(error, setError, ['title', 'visibility']);
      if (text) setNotice({ tone: 'danger', text });
    }
  });

  return (
    <View style={styles.form} testID="upload-form">
      <TextField control={control} name="title" label="Title" hint="For example: referral letter, setup photo." testID="document-title" />
      <SegmentedControl label="Who can open it" options={visibilities} value={visibility.value ?? 'private'} onChange={visibility.onChange} />
      <View style={styles.row}>
        <Button testID="document-choose" variant="secondary" icon="attach-outline" label={file ? 'Choose another file' : 'Choose a file'} onPress={() => void choose()} />
        <AppText variant="caption" tone="muted" testID="document-chosen">
          {file ? `${file.name} (${Math.max(1, Math.round(file.size / 1024))} KB)` : 'PDF, PNG, JPEG or WebP, up to 10 MB.'}
        </AppText>
      </View>
      {notice ? <Banner tone={notice.tone} testID="document-notice">{notice.text}</Banner> : null}
      <Button testID="document-upload" icon="cloud-upload-outline" label="Upload" onPress={submit} loading={upload.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
