// A component fetched on first use, so libraries only some screens need (charts, the table,
// the station plot) stay out of what the sign-in screen downloads.
import { type ComponentType, lazy, Suspense } from 'react';

import { Text } from '@/components/ui/text';

export function lazyView<P extends object>(load: () => Promise<ComponentType<P>>, what: string): ComponentType<P> {
  const Lazy = lazy(async () => ({ default: await load() }));
  return function LazyView(props: P) {
    return (
      <Suspense fallback={<Text variant="muted">{`Loading ${what}…`}</Text>}>
        <Lazy {...props} />
      </Suspense>
    );
  };
}
