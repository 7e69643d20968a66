import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useNavItems } from '@/hooks/use-nav-items';
import { useTheme } from '@/hooks/use-theme';
import type { Me } from '@/shared/schemas/role';
import { SideNav } from './side-nav';
import { TopBar } from './top-bar';

export interface AppShellProps {
  me: Me;
  children: ReactNode;
}

/** The signed-in frame: side navigation from the wide breakpoint, a top bar on phones. */
export function AppShell({ me, children }: AppShellProps) {
  const { colors } = useTheme();
  const { isWide } = useBreakpoints();
  const insets = useSafeAreaInsets();
  const items = useNavItems(me.role);
  return (
    <View style={[styles.root, { backgroundColor: colors.background, paddingTop: insets.top }, isWide && styles.row]}>
      {isWide ? <SideNav me={me} items={items} /> : <TopBar items={items} />}
      <View style={styles.main} role="main">
        {children}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  row: { flexDirection: 'row' },
  main: { flex: 1 },
});
