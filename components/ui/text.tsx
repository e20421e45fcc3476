import { Text as RNText, type TextProps as RNTextProps, StyleSheet } from 'react-native';
import { colors, type TypeVariant, typography } from '../../constants/theme';

type Tone = 'default' | 'muted' | 'danger' | 'success' | 'warning' | 'onPrimary' | 'primary';

export interface TextProps extends RNTextProps {
  variant?: TypeVariant;
  tone?: Tone;
  /** Makes the text a document heading of this level (h1, h2 … on the web). */
  headingLevel?: 1 | 2 | 3;
}

/** All text in Dilato goes through here so that font, size and colour come from the theme. */
export function Text({ variant = 'body', tone = 'default', headingLevel, style, ...rest }: TextProps) {
  const headingProps = headingLevel ? { role: 'heading' as const, 'aria-level': headingLevel } : {};
  return <RNText {...headingProps} style={[styles[variant], toneStyles[tone], style]} {...rest} />;
}

const styles = StyleSheet.create({
  display: typography.display,
  title: typography.title,
  heading: typography.heading,
  body: typography.body,
  bodyStrong: typography.bodyStrong,
  label: typography.label,
  caption: typography.caption,
  overline: { ...typography.overline, textTransform: 'uppercase' },
});

const toneStyles = StyleSheet.create({
  default: { color: colors.text },
  muted: { color: colors.textMuted },
  danger: { color: colors.danger },
  success: { color: colors.success },
  warning: { color: colors.warning },
  onPrimary: { color: colors.onPrimary },
  primary: { color: colors.primary },
});
