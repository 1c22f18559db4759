import { useEffect, useRef } from 'react';

import type { KeyHandlers } from './use-keyboard';

export type { KeyHandlers };

const TYPING = new Set(['INPUT', 'TEXTAREA', 'SELECT']);
// Enter and Space belong to the control that has focus, never to a screen shortcut.
const CONTROL = 'a, button, [role="button"], [role="link"], [role="radio"], [role="checkbox"], [role="tab"], [role="row"]';

// Single-key shortcuts on desktop. Keys are ignored while the person is typing in a field,
// and never fire with Ctrl, Alt or Meta held, so browser shortcuts keep working.
export function useKeyboard(handlers: KeyHandlers, enabled = true) {
  const latest = useRef(handlers);
  useEffect(() => {
    latest.current = handlers;
  });
  useEffect(() => {
    if (!enabled) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.ctrlKey || event.altKey || event.metaKey || event.defaultPrevented) return;
      const target = event.target as HTMLElement | null;
      if (target && (TYPING.has(target.tagName) || target.isContentEditable)) return;
      if ((event.key === 'Enter' || event.key === ' ') && target?.closest?.(CONTROL)) return;
      const handler = latest.current[event.key];
      if (handler) handler(event);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [enabled]);
}
