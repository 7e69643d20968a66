import { useSyncExternalStore } from 'react';
import { Dimensions } from 'react-native';
import { breakpoints } from '@/constants/theme';

type Layout = 'phone' | 'medium' | 'wide';

function subscribe(onChange: () => void): () => void {
  const subscription = Dimensions.addEventListener('change', onChange);
  return () => subscription.remove();
}

function layoutOf(width: number): Layout {
  if (width >= breakpoints.wide) return 'wide';
  return width >= breakpoints.medium ? 'medium' : 'phone';
}

const windowLayout = () => layoutOf(Dimensions.get('window').width);
// The server draws the web pages for a phone (this is its snapshot); in the browser the app draws for the
// real width from its first render. The layout, not the width, is what is compared: resizing within a
// layout redraws nothing.
const prerenderedLayout = (): Layout => 'phone';

/** One place that decides the layout: phone first, wider panes from `medium`, side navigation from `wide`. */
export function useBreakpoints() {
  const layout = useSyncExternalStore(subscribe, windowLayout, prerenderedLayout);
  return { isMedium: layout !== 'phone', isWide: layout === 'wide' };
}
