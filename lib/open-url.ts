import { Linking, Platform } from 'react-native';
import { apiBaseUrl } from './api-client';

/** Opens a server page or file (printable plan, a document) in a new tab; the session cookie goes along. */
export function openServerPath(path: string): void {
  const url = `${apiBaseUrl()}${path}`;
  if (Platform.OS === 'web' && typeof window !== 'undefined') {
    window.open(url, '_blank', 'noopener');
    return;
  }
  void Linking.openURL(url);
}
