// Whether the browser believes it has a connection. A failed request is the real test; this
// only tells when to try again.
import { useEffect, useState } from 'react';

const navigatorOnline = () => typeof navigator === 'undefined' || navigator.onLine !== false;

export function useOnline(): boolean {
  const [online, setOnline] = useState(navigatorOnline);
  useEffect(() => {
    if (typeof window === 'undefined' || !window.addEventListener) return;
    const update = () => setOnline(navigatorOnline());
    window.addEventListener('online', update);
    window.addEventListener('offline', update);
    return () => {
      window.removeEventListener('online', update);
      window.removeEventListener('offline', update);
    };
  }, []);
  return online;
}
