// Which columns a table shows, chosen by the person and remembered on this device.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from './button';
import { Checkbox } from './checkbox';
import { space } from './theme';

const storageKey = (key: string) => `sightline.columns.${key}`;

function readHidden(key: string, fallback: string[]): string[] {
  try {
    const raw = globalThis.localStorage?.getItem(storageKey(key));
    const parsed: unknown = raw ? JSON.parse(raw) : null;
    return Array.isArray(parsed) && parsed.every((v) => typeof v === 'string') ? parsed : fallback;
  } catch {
    return fallback;
  }
}

export function useHiddenColumns(key: string | undefined, hiddenByDefault: string[]) {
  const [hidden, setHidden] = useState<string[]>(() => (key ? readHidden(key, hiddenByDefault) : hiddenByDefault));
  const toggle = (id: string, show: boolean) => {
    const next = show ? hidden.filter((h) => h !== id) : [...hidden, id];
    setHidden(next);
    if (key) globalThis.localStorage?.setItem(storageKey(key), JSON.stringify(next));
  };
  return { hidden, toggle };
}

export function ColumnChoice({
  columns,
  hidden,
  onToggle,
}: {
  columns: { id: string; header: string }[];
  hidden: string[];
  onToggle: (id: string, show: boolean) => void;
}) {
  const [open, setOpen] = useState(false);
  const hiddenCount = columns.filter((c) => hidden.includes(c.id)).length;
  return (
    <View style={styles.box}>
      <Button
        label={`Columns${hiddenCount ? ` (${hiddenCount} hidden)` : ''}`}
        tone="secondary"
        onPress={() => setOpen((o) => !o)}
        accessibilityHint={open ? 'Hides the column choices' : 'Shows the column choices'}
      />
      {open ? (
        <View style={styles.list} role="group" aria-label="Columns to show">
          {columns.map((c) => (
            <Checkbox key={c.id} label={c.header} checked={!hidden.includes(c.id)} onChange={(show) => onToggle(c.id, show)} />
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, alignItems: 'flex-start' },
  list: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
});
