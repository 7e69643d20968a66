import { useWindowDimensions } from 'react-native';
import { breakpoints } from '@/constants/theme';

/** One place that decides the layout: phone first, wider panes from `medium`, side navigation from `wide`. */
export function useBreakpoints() {
  const { width } = useWindowDimensions();
  return {
    width,
    isMedium: width >= breakpoints.medium,
    isWide: width >= breakpoints.wide,
  };
}
