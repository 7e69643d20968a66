import { Text, type TextProps, type TextStyle } from 'react-native';
import { fonts, fontSizes, lineHeights, type ColorTokens } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';

export type TextVariant = 'display' | 'title' | 'heading' | 'body' | 'bodyStrong' | 'label' | 'caption';
export type TextTone = 'default' | 'muted' | 'primary' | 'onPrimary' | 'danger' | 'warning' | 'success' | 'info';

const variants: Record<TextVariant, TextStyle> = {
  display: { fontFamily: fonts.display, fontSize: fontSizes.display, lineHeight: lineHeights.display },
  title: { fontFamily: fonts.display, fontSize: fontSizes.xxl, lineHeight: lineHeights.xxl },
  heading: { fontFamily: fonts.bold, fontSize: fontSizes.lg, lineHeight: lineHeights.lg },
  body: { fontFamily: fonts.body, fontSize: fontSizes.md, lineHeight: lineHeights.md },
  bodyStrong: { fontFamily: fonts.bold, fontSize: fontSizes.md, lineHeight: lineHeights.md },
  label: { fontFamily: fonts.medium, fontSize: fontSizes.sm, lineHeight: lineHeights.sm },
  caption: { fontFamily: fonts.body, fontSize: fontSizes.sm, lineHeight: lineHeights.sm },
};

const toneColor: Record<TextTone, keyof ColorTokens> = {
  default: 'text',
  muted: 'textMuted',
  primary: 'primary',
  onPrimary: 'onPrimary',
  danger: 'danger',
  warning: 'warning',
  success: 'success',
  info: 'info',
};

export interface AppTextProps extends TextProps {
  variant?: TextVariant;
  tone?: TextTone;
}

/** All text in the app goes through here so type and colour come from the theme. */
export function AppText({ variant = 'body', tone = 'default', style, ...rest }: AppTextProps) {
  const { colors } = useTheme();
  const headingRole = variant === 'display' || variant === 'title' || variant === 'heading';
  return (
    <Text
      role={headingRole ? 'heading' : undefined}
      style={[variants[variant], { color: colors[toneColor[tone]] }, style]}
      {...rest}
    />
  );
}
