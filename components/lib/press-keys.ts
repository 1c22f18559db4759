// A radio-like choice is chosen with Space or Enter, as the platform's own radios are; the key
// goes no further (no page scroll, no screen shortcut). Web only: react-native-web passes
// onKeyDown to the element.
type KeyEvent = { key: string; preventDefault: () => void; stopPropagation: () => void };

export function chooseOnKeys(onChoose: () => void): object {
  return {
    onKeyDown: (event: KeyEvent) => {
      if (event.key !== ' ' && event.key !== 'Enter') return;
      event.preventDefault();
      event.stopPropagation();
      onChoose();
    },
  };
}
