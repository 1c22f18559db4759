// Ticked rows of a list, with shift-click selecting the range from the last row clicked.
import { useCallback, useRef, useState } from 'react';

export function useRowSelection(ids: number[]) {
  const [selected, setSelected] = useState<number[]>([]);
  const lastClicked = useRef<number | null>(null);
  const toggle = useCallback(
    (id: number, on: boolean, range: boolean) => {
      const from = lastClicked.current === null ? -1 : ids.indexOf(lastClicked.current);
      const to = ids.indexOf(id);
      const span = range && from >= 0 && to >= 0 ? ids.slice(Math.min(from, to), Math.max(from, to) + 1) : [id];
      lastClicked.current = id;
      setSelected((current) => (on ? [...new Set([...current, ...span])] : current.filter((s) => !span.includes(s))));
    },
    [ids],
  );
  return { selected, setSelected, toggle };
}
