import { Linking, Platform, StyleSheet } from 'react-native';
import { useRouter } from 'expo-router';
import { AppText } from '@/components/ui/text';

// Plain-text e-mails carry bare links; anything from http(s):// to the next space is one.
const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

export interface LinkedTextProps {
  text: string;
  testID?: string;
}

/** Shows a plain-text message with its web addresses turned into links that open. */
export function LinkedText({ text, testID }: LinkedTextProps) {
  const router = useRouter();
  // A link back into this app (an invitation, a reset) opens here; anything else goes to the browser.
  const open = (url: string) => {
    if (Platform.OS === 'web' && typeof window !== 'undefined') {
      const target = new URL(url);
      if (target.origin === window.location.origin) {
        router.push(`${target.pathname}${target.search}`);
        return;
      }
    }
    Linking.openURL(url).catch(() => undefined);
  };
  const parts = text.split(URL_PATTERN);
  let offset = 0;
  return (
    <AppText testID={testID} style={styles.body} selectable>
      {parts.map((part) => {
        const key = `${offset}`;
        offset += part.length;
        if (!/^https?:\/\//.test(part)) return part ? <AppText key={key}>{part}</AppText> : null;
        return (
          <AppText
            key={key}
            testID="mail-link"
            accessibilityRole="link"
            accessibilityLabel={`Open link ${part}`}
            tone="primary"
            style={styles.link}
            onPress={() => open(part)}
          >
            {part}
          </AppText>
        );
      })}
    </AppText>
  );
}

const styles = StyleSheet.create({
  body: { flexShrink: 1 },
  link: { textDecorationLine: 'underline' },
});
