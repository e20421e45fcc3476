import { Text } from './text';

/** The message under a field or group that did not pass; nothing when there is none. */
export function FieldError({ message }: { message?: string | null }) {
  if (!message) return null;
  return (
    <Text variant="caption" tone="danger">
      {message}
    </Text>
  );
}
