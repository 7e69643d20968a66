import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { radii, spacing } from '@/constants/theme';
import { CALENDAR_DOWNLOAD_PATH, useCalendarFeedQuery, useCreateCalendarFeedMutation } from '@/hooks/use-calendar-feed';
import { useTheme } from '@/hooks/use-theme';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { openDownload } from './documents-card';

async function copy(text: string): Promise<boolean> {
  const clipboard = typeof navigator === 'undefined' ? undefined : navigator.clipboard;
  if (!clipboard) return false;
  try {
    await clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

/** Sessions in the musician's own calendar: a one-off .ics file, or a private link that follows the plan. */
export function CalendarCard() {
  const { colors } = useTheme();
  const feed = useCalendarFeedQuery();
  const create = useCreateCalendarFeedMutation();
  const [confirming, setConfirming] = useState(false);
  const [copied, setCopied] = useState<boolean | null>(null);
  const existing = feed.data?.feed ?? null;
  const url = create.data?.url ?? null;
  const makeLink = () => {
    setConfirming(false);
    setCopied(null);
    create.mutate();
  };
  return (
    <Card testID="calendar-card">
      <AppText variant="heading">Sessions in your calendar</AppText>
      <AppText tone="muted">Download a file with your planned sessions, or subscribe so your calendar follows holds and step-backs.</AppText>
      <Button testID="calendar-download" label="Download .ics file" icon="download-outline" variant="secondary" onPress={() => openDownload(CALENDAR_DOWNLOAD_PATH)} />
      {url ? (
        <View style={styles.block} testID="calendar-link">
          <AppText variant="bodyStrong">Your private link (shown once: keep it to yourself)</AppText>
          <AppText selectable testID="calendar-link-url" style={[styles.url, { borderColor: colors.border, backgroundColor: colors.surfaceMuted }]}>
            {url}
          </AppText>
          <Button testID="calendar-copy" label="Copy link" icon="copy-outline" onPress={() => void copy(url).then(setCopied)} />
          {copied === true ? <AppText tone="success" variant="label">Copied. Paste it into your calendar’s “subscribe” option.</AppText> : null}
          {copied === false ? <AppText variant="label">Select the link above and copy it by hand.</AppText> : null}
        </View>
      ) : null}
      {existing && !url ? (
        <AppText testID="calendar-link-exists">{`You made a private link on ${format(parseISO(existing.createdAt), 'd MMMM yyyy')}.`}</AppText>
      ) : null}
      {confirming ? (
        <Banner tone="warning" title="Make a new link?" testID="calendar-confirm">
          <AppText variant="caption">The old link stops working at once in every calendar that uses it.</AppText>
          <View style={styles.row}>
            <Button testID="calendar-confirm-yes" label="Make a new link" onPress={makeLink} />
            <Button testID="calendar-confirm-no" label="Keep the old one" variant="secondary" onPress={() => setConfirming(false)} />
          </View>
        </Banner>
      ) : (
        <Button
          testID="calendar-subscribe"
          label={existing || url ? 'Make a new private link' : 'Create a private link'}
          icon="link-outline"
          loading={create.isPending}
          variant={existing || url ? 'ghost' : 'primary'}
          onPress={() => (existing || url ? setConfirming(true) : makeLink())}
        />
      )}
      {create.isError ? <Banner tone="danger">{create.error.message}</Banner> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  block: { gap: spacing.sm },
  url: { borderWidth: 1, borderRadius: radii.sm, padding: spacing.sm, fontSize: 13 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.xs },
});
