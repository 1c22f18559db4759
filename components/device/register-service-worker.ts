// On the web build only (never in development): the worker that keeps the app shell on the
// device so it opens without a connection.
import { Platform } from 'react-native';

export function registerServiceWorker() {
  if (Platform.OS !== 'web' || __DEV__) return;
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  const register = () =>
    navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch((error) => console.warn('service worker:', error));
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}
