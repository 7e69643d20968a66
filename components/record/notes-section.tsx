import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { format } from 'date-fns/format';
import { radii, spacing } from '@/constants/theme';
import { useAddNoteMutation, useNotesQuery } from '@/hooks/use-record';
import { useTheme } from '@/hooks/use-theme';
import { applyServerErrors } from '@/lib/form-errors';
import { CreateClinicalNoteSchema, type CreateClinicalNote } from '@/shared/schemas/record';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';

/** Private clinical notes: add one, read them newest first. Only this clinician sees them. */
export function NotesSection({ id }: { id: string }) {
  const { colors } = useTheme();
  const notes = useNotesQuery(id);
  const add = useAddNoteMutation(id);
  const { control, handleSubmit, setError, reset, formState } = useForm<CreateClinicalNote>({
    resolver: zodResolver(CreateClinicalNoteSchema),
    defaultValues: { body: '' },
  });
  const submit = handleSubmit(async (values) => {
    try {
      await add.mutateAsync(values);
      reset({ body: '' });
    } catch (error) {
      const message = applyServerErrors(error, setError, ['body']);
      if (message) setError('root', { type: 'server', message });
    }
  });

  return (
    <Section title="Clinical notes" description="Private to you: never shown to the musician or a teacher." testID="record-notes">
      <View style={styles.form}>
        <TextField control={control} name="body" label="New note" testID="note-body" />
        <Button testID="note-add" label="Add note" icon="add-outline" onPress={submit} loading={add.isPending} />
        {formState.errors.root ? (
          <Banner tone="danger" testID="note-error">
            {formState.errors.root.message ?? 'The note was not saved.'}
          </Banner>
        ) : null}
      </View>
      {notes.isPending ? <LoadingState label="Loading notes…" /> : null}
      {notes.isError ? <ErrorState error={notes.error} onRetry={() => notes.refetch()} testID="notes-error" /> : null}
      {notes.data && notes.data.length === 0 ? <AppText tone="muted">No notes yet.</AppText> : null}
      {notes.data && notes.data.length > 0 ? (
        <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="note-list">
          {notes.data.map((note, position) => (
            <View key={note.id} style={[styles.note, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]} testID="note-row">
              <AppText>{note.body}</AppText>
              <AppText variant="caption" tone="muted">{`${note.authorName}, ${format(new Date(note.createdAt), 'd MMM yyyy HH:mm')}`}</AppText>
            </View>
          ))}
        </View>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.sm },
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  note: { padding: spacing.md, gap: spacing.xxs },
});
