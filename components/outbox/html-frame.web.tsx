import type { CSSProperties } from 'react';
import { colors, radii } from '../../constants/theme';
import type { HtmlFrameProps } from './html-frame';

const frameStyle: CSSProperties = {
  width: '100%',
  minHeight: 320,
  border: `1px solid ${colors.border}`,
  borderRadius: radii.md,
  backgroundColor: colors.surfaceRaised,
};

/**
 * The e-mail's HTML in an iframe with an empty sandbox: no script runs, no form posts, no
 * navigation of this page, and the frame gets an opaque origin with no access to the app.
 */
export function HtmlFrame({ html, title }: HtmlFrameProps) {
  return <iframe title={title} sandbox="" srcDoc={html} referrerPolicy="no-referrer" style={frameStyle} />;
}
