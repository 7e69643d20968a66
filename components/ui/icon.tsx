import { useSyncExternalStore } from 'react';
import { Platform, View, type StyleProp, type ViewStyle } from 'react-native';
import createIconSet from '@expo/vector-icons/createIconSet';
import { FontDisplay, loadAsync } from 'expo-font';
import { iconGlyphs } from '@/constants/icon-glyphs';

/** Ionicons names; only those in constants/icon-glyphs.ts (scripts/subset-icons.mjs adds one). */
export type IconName = keyof typeof iconGlyphs;

// Ionicons cut down to the glyphs the app draws: 25 KB instead of 390 KB.
const Glyphs = createIconSet(iconGlyphs, 'ritorno-icons', require('../../assets/fonts/RitornoIcons.ttf'));

export interface IconProps {
  name: IconName;
  size: number;
  color: string;
  /** Placement of the icon's box (margins); the glyph itself is centred in it. */
  style?: StyleProp<ViewStyle>;
}

// On the web the icon font arrives after the first paint. It is asked for here, once, in
// the browser (font-display: swap, so no text waits for it), and glyphs are drawn only once it is in:
// before that a glyph would show as an empty box in the system font. Pages are drawn by the server without
// glyphs, and the first render in the browser matches them (the server snapshot below). Native apps
// load the font as vector-icons always has.
let fontReady = Platform.OS !== 'web';
const listeners = new Set<() => void>();
if (!fontReady && typeof window !== 'undefined') {
  const fonts = Object.fromEntries(Object.entries(Glyphs.font).map(([name, uri]) => [name, { uri, display: FontDisplay.SWAP }]));
  loadAsync(fonts)
    .then(() => {
      fontReady = true;
      for (const listener of listeners) listener();
    })
    .catch(() => undefined);
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * An Ionicons glyph in a box of its own size, hidden from assistive technology (the words beside it say
 * the same). The box is there from the first paint, so a glyph arriving later moves nothing around it.
 */
export function Icon({ name, size, color, style }: IconProps) {
  const ready = useSyncExternalStore(subscribe, () => fontReady, () => false);
  return (
    <View style={[{ width: size, height: size, alignItems: 'center', justifyContent: 'center' }, style]} accessibilityElementsHidden importantForAccessibility="no-hide-descendants" aria-hidden>
      {ready ? <Glyphs name={name} size={size} color={color} style={{ lineHeight: size }} /> : null}
    </View>
  );
}
