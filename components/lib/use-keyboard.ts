// Keyboard shortcuts exist only where there is a hardware keyboard: the web build
// (use-keyboard.web.ts). On phones this is a no-op.
export type KeyHandlers = Record<string, (event: { key: string; preventDefault: () => void }) => void>;

export function useKeyboard(_handlers: KeyHandlers, _enabled = true) {}
