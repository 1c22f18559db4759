import { useEffect, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { SEARCH_MAX_LENGTH } from '@/shared/search';

import { TextField } from './text-field';

const PAUSE_MS = 350;

// A search field that hands its text on after a short pause in typing (or on Enter), so
// the list is not fetched at every key press. The committed text lives with the caller.
export function SearchBox({ label, value, onSearch }: { label: string; value: string; onSearch: (text: string) => void }) {
  const [text, setText] = useState(value);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  // The committed text changed elsewhere (back button, a cleared filter): show it.
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    setShown(value);
    setText(value);
  }
  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  const commit = (next: string) => {
    if (timer.current) clearTimeout(timer.current);
    if (next.trim() !== value) onSearch(next.trim());
  };
  return (
    <View style={styles.box}>
      <TextField
        label={label}
        value={text}
        role="searchbox"
        maxLength={SEARCH_MAX_LENGTH}
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
        onChangeText={(next) => {
          setText(next);
          if (timer.current) clearTimeout(timer.current);
          timer.current = setTimeout(() => commit(next), PAUSE_MS);
        }}
        onSubmitEditing={() => commit(text)}
      />
    </View>
  );
}

const styles = StyleSheet.create({ box: { minWidth: 220, flexGrow: 1, maxWidth: 420 } });
