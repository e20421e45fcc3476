import { Linking, Platform } from 'react-native';

/** The provider's page replaces the quote page in the same tab on the web, so it can send the customer back. */
export function goToPaymentPage(url: string): void {
  if (Platform.OS === 'web') window.location.assign(url);
  else void Linking.openURL(url);
}
