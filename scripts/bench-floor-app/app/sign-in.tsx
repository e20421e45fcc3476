import { Text, TextInput, View } from 'react-native';

// The least an Expo Router screen with one labelled field can be.
export default function SignIn() {
  return (
    <View>
      <Text nativeID="email-label">Email</Text>
      <TextInput aria-labelledby="email-label" />
    </View>
  );
}
