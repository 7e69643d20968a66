import { Linking, Platform, StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import { myDocumentHref, useMyDocumentsQuery } from '@/hooks/use-my-documents';
import { apiBaseUrl } from '@/lib/api-client';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { AppText } from '@/components/ui/text';

export function openDownload(path: string): void {
  const url = `${apiBaseUrl()}${path}`;
  if (Platform.OS === 'web' && typeof window !== 'undefined') window.location.assign(url);
  else void Linking.openURL(url);
}

/** Letters, handouts and setup photos the clinician shared, to download. */
export function DocumentsCard() {
  const documents = useMyDocumentsQuery();
  return (
    <Card testID="my-documents">
      <AppText variant="heading">From your clinician</AppText>
      {documents.isError ? <ErrorState error={documents.error} onRetry={() => documents.refetch()} testID="my-documents-error" /> : null}
      {documents.data?.length === 0 ? <AppText tone="muted">No documents shared with you yet.</AppText> : null}
      {documents.data?.map((doc) => (
        <View key={doc.id} style={styles.row}>
          <View style={styles.flex}>
            <AppText variant="bodyStrong">{doc.title}</AppText>
            <AppText variant="caption" tone="muted">{`${doc.fileName} · ${format(parseISO(doc.createdAt), 'd MMM yyyy')}`}</AppText>
          </View>
          <Button testID={`document-download-${doc.id}`} label="Download" accessibilityLabel={`Download ${doc.title}`} icon="download-outline" variant="secondary" onPress={() => openDownload(myDocumentHref(doc.id))} />
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingTop: spacing.xs },
  flex: { flex: 1 },
});
