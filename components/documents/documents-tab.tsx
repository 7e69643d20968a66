import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useDocumentsQuery } from '@/hooks/use-documents';
import { TwoPanes } from '@/components/record/two-panes';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';
import { DocumentRow } from './document-row';
import { UploadForm } from './upload-form';

/** Letters, handouts and setup photos attached to the record; never visible to a teacher. */
export function DocumentsTab({ id }: { id: string }) {
  const documents = useDocumentsQuery(id);
  const list = (
    <Section title="Documents" description="Private ones are yours only; shared ones the musician can open too. Teachers never see them." testID="record-documents">
      {documents.isPending ? <LoadingState label="Loading documents…" /> : null}
      {documents.isError ? <ErrorState error={documents.error} onRetry={() => documents.refetch()} testID="documents-error" /> : null}
      {documents.data?.length === 0 ? <AppText tone="muted">No documents yet.</AppText> : null}
      <View style={styles.list}>
        {documents.data?.map((document) => (
          <DocumentRow key={document.id} id={id} document={document} />
        ))}
      </View>
    </Section>
  );
  const form = (
    <Section title="Attach a document">
      <Card>
        <UploadForm id={id} />
      </Card>
    </Section>
  );
  return <TwoPanes main={list} side={form} />;
}

const styles = StyleSheet.create({ list: { gap: spacing.sm } });
