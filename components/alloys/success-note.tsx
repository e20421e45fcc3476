import { Text } from '../ui/text';
import { View } from 'react-native';

/** A confirmation announced politely to screen readers. */
export function SuccessNote({ message }: { message: string }) {
  return (
    <View accessible accessibilityRole="alert" aria-live="polite">
      <Text tone="success" variant="bodyStrong">
        {message}
      </Text>
    </View>
  );
}
