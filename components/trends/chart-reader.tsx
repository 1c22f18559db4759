// The keyboard way to read a chart: the chart is one tab stop; the arrow keys (and Home/End)
// move between its points, and the value is shown and announced below it. The marks
// themselves are hidden from assistive technology; the text summary describes the whole.
import { View } from 'react-native';

type Props = {
  label: string;
  count: number;
  picked: number | null;
  onPick: (index: number) => void;
  children: React.ReactNode;
};

export function ChartReader({ label, count, picked, onPick, children }: Props) {
  const onKeyDown = (event: { key: string; preventDefault: () => void }) => {
    if (count === 0) return;
    const at = picked ?? -1;
    const next =
      event.key === 'ArrowRight' || event.key === 'ArrowDown'
        ? Math.min(at + 1, count - 1)
        : event.key === 'ArrowLeft' || event.key === 'ArrowUp'
          ? Math.max(at - 1, 0)
          : event.key === 'Home'
            ? 0
            : event.key === 'End'
              ? count - 1
              : null;
    if (next === null) return;
    event.preventDefault();
    onPick(next);
  };
  return (
    <View
      focusable
      role="group"
      aria-label={`${label}. Use the arrow keys to read each point.`}
      // react-native-web passes keyboard handlers to the DOM element.
      {...({ onKeyDown } as object)}
    >
      {children}
    </View>
  );
}

export const READ_HINT = 'Tap a point, or focus the chart and use the arrow keys, to read its value.';
