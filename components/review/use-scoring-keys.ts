// Desktop keys of the scoring screen: move between criteria and score the current one.
import { useKeyboard } from '@/components/lib/use-keyboard';
import type { Criterion } from '@/shared/rubric';

export const SCORING_KEYS = [
  { keys: '↓ or j', action: 'Next criterion' },
  { keys: '↑ or k', action: 'Previous criterion' },
  { keys: '0 1 2 3 4', action: 'Score the current criterion' },
  { keys: 'p / f', action: 'Pass or fail a pass/fail criterion' },
  { keys: '?', action: 'Show or hide these keys' },
];

type Options = {
  criteria: Criterion[];
  current: number;
  setCurrent: (update: (index: number) => number) => void;
  setScore: (index: number, value: number) => void;
  toggleHelp: () => void;
  enabled: boolean;
};

export function useScoringKeys({ criteria, current, setCurrent, setScore, toggleHelp, enabled }: Options) {
  const move = (step: number) => setCurrent((i) => Math.min(Math.max(i + step, 0), criteria.length - 1));
  const passFail = criteria[current]?.scale.kind === 'pass_fail';
  useKeyboard(
    {
      ArrowDown: (e) => {
        e.preventDefault();
        move(1);
      },
      j: () => move(1),
      ArrowUp: (e) => {
        e.preventDefault();
        move(-1);
      },
      k: () => move(-1),
      ...Object.fromEntries([0, 1, 2, 3, 4].map((n) => [String(n), () => !passFail && setScore(current, n)])),
      p: () => passFail && setScore(current, 1),
      f: () => passFail && setScore(current, 0),
      '?': toggleHelp,
    },
    enabled,
  );
}
