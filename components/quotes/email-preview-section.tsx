import { messageOf } from '../../hooks/api-client';
import { useEmailPreviewQuery } from '../../hooks/use-quotes';
import { MessageView } from '../outbox/message-view';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Text } from '../ui/text';

/** The e-mail as the customer will get it; the private link is only made when the quote is sent. */
export function EmailPreviewSection({ quoteId }: { quoteId: string }) {
  const preview = useEmailPreviewQuery(quoteId, true);
  return (
    <Card>
      <Text variant="heading" headingLevel={2}>
        E-mail preview
      </Text>
      <Text variant="caption" tone="muted">
        The link reads “/q/…” here; the real private link is made when you send.
      </Text>
      {preview.isPending ? (
        <LoadingState label="Loading the preview…" />
      ) : preview.isError ? (
        <ErrorBanner title="The preview did not load" message={messageOf(preview.error)} onRetry={() => void preview.refetch()} />
      ) : (
        <MessageView subject={preview.data.subject} to={preview.data.to} text={preview.data.text} html={preview.data.html} />
      )}
    </Card>
  );
}
