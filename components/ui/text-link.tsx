import { Pressable, StyleSheet } from 'react-native';
import { Link, type Href } from 'expo-router';
import { touchTarget } from '@/constants/theme';
import { AppText } from './text';

export interface TextLinkProps {
  href: Href;
  label: string;
  testID: string;
  accessibilityLabel?: string;
}

/** An in-app link in running text, tall enough to hit with a thumb. */
export function TextLink({ href, label, testID, accessibilityLabel }: TextLinkProps) {
  return (
    <Link href={href} asChild>
      <Pressable testID={testID} accessibilityRole="link" accessibilityLabel={accessibilityLabel ?? label} style={styles.hit}>
        <AppText variant="bodyStrong" tone="primary" style={styles.text}>
          {label}
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  hit: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  text: { textDecorationLine: 'underline' },
});
