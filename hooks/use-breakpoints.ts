import { useSyncExternalStore } from 'react';
import { Dimensions } from 'react-native';
import { breakpoints } from '@/constants/theme';

function subscribe(onChange: () => void): () => void {
  const subscription = Dimensions.addEventListener('change', onChange);
  return () => subscription.remove();
}

const windowWidth = () => Dimensions.get('window').width;
// The web pages are rendered ahead of time for a phone (width 0: no wider panes). While React takes over
// such a page it must render the same, so it reads this first and re-renders at once at the real width.
const prerenderedWidth = () => 0;

/** One place that decides the layout: phone first, wider panes from `medium`, side navigation from `wide`. */
export function useBreakpoints() {
  const width = useSyncExternalStore(subscribe, windowWidth, prerenderedWidth);
  return {
    width,
    isMedium: width >= breakpoints.medium,
    isWide: width >= breakpoints.wide,
  };
}
