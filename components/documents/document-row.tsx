import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { spacing } from '@/constants/theme';
import { documentsPath, useDeleteDocumentMutation, useUpdateDocumentMutation } from '@/hooks/use-documents';
import { openServerPath } from '@/lib/open-url';
import type { DocumentRecord } from '@/shared/schemas/document';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDelete } from '@/components/ui/confirm-delete';
import { StatusBadge } from '@/components/ui/status-badge';
import { AppText } from '@/components/ui/text';

/** One attached file: open it, share or unshare it with the musician, or delete it. */
export function DocumentRow({ id, document }: { id: string; document: DocumentRecord }) {
  const update = useUpdateDocumentMutation(id);
  const remove = useDeleteDocumentMutation(id);
  const shared = document.visibility === 'shared';
  return (
    <Card testID="document-row">
      <View style={styles.head}>
        <View style={styles.text}>
          <AppText variant="bodyStrong">{document.title}</AppText>
          <AppText variant="caption" tone="muted">{`${document.fileName} · ${Math.max(1, Math.round(document.sizeBytes / 1024))} KB · ${format(new Date(document.createdAt), 'd MMM yyyy')}`}</AppText>
        </View>
        {shared ? <StatusBadge tone="success" icon="people-outline" label="Shared with musician" /> : <StatusBadge tone="neutral" icon="lock-closed-outline" label="Private" />}
      </View>
      <View style={styles.actions}>
        <Button testID={`document-open-${document.id}`} variant="secondary" icon="download-outline" label="Open" accessibilityLabel={`Open ${document.title}`} onPress={() => openServerPath(`${documentsPath(id)}/${encodeURIComponent(document.id)}/file`)} />
        <Button
          testID={`document-visibility-${document.id}`}
          variant="secondary"
          icon={shared ? 'lock-closed-outline' : 'share-outline'}
          label={shared ? 'Make private' : 'Share with musician'}
          onPress={() => update.mutate({ docId: document.id, body: { visibility: shared ? 'private' : 'shared' } })}
          loading={update.isPending}
        />
        <ConfirmDelete
          testID={`document-delete-${document.id}`}
          label="Delete"
          accessibilityLabel={`Delete ${document.title}`}
          question={`Delete ‘${document.title}’ from this record?`}
          detail={shared ? 'The file is removed for good, and the musician can no longer open it.' : 'The file is removed for good.'}
          busy={remove.isPending}
          error={remove.isError ? remove.error.message : null}
          onConfirm={() => remove.mutate(document.id)}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm },
  text: { flex: 1, minWidth: 200, gap: spacing.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
