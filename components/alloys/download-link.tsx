import { Text } from '../ui/text';
import { linkStyles } from '../ui/text-link';

export interface DownloadLinkProps {
  href: string;
  label: string;
  accessibilityLabel?: string;
}

/**
 * A plain link the browser follows itself: the server answers with an attachment, and the
 * session cookie goes along, so no script has to hold the file in memory.
 */
export function DownloadLink({ href, label, accessibilityLabel }: DownloadLinkProps) {
  // react-native-web renders Text with href as an <a>; hrefAttrs adds the download attribute.
  const web = { href, hrefAttrs: { download: '' } } as object;
  return (
    <Text accessibilityRole="link" accessibilityLabel={accessibilityLabel ?? label} style={linkStyles.link} {...web}>
      {label}
    </Text>
  );
}
