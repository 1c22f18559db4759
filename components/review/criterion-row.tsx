import { useEffect, useRef } from 'react';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';

import { chooseOnKeys } from '@/components/lib/press-keys';
import { Badge } from '@/components/ui/badge';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { type Criterion, scaleMax } from '@/shared/rubric';
import { isBelowFullMarks } from '@/shared/scoring';
import { commentAfterStockReason } from '@/shared/stock-reasons';

export type CriterionEntry = { score: number | null | undefined; stockReason: string | null; comment: string };

type Props = {
  criterion: Criterion;
  applies: boolean;
  entry: CriterionEntry;
  current: boolean;
  // Revision whose score this one still carries, until the reviewer changes it.
  carriedFrom?: number | null;
  // Findings of the station analysis the reviewer may take as a starting comment.
  suggestions?: string[];
  error?: string;
  onChange: (entry: CriterionEntry) => void;
  onFocus: () => void;
};

export function CriterionRow({ criterion, applies, entry, current, carriedFrom, suggestions = [], error, onChange, onFocus }: Props) {
  const max = scaleMax(criterion.scale);
  const choices =
    criterion.scale.kind === 'levels'
      ? criterion.scale.levels.map((label, value) => ({ value, short: String(value), label: `${value}: ${label}` }))
      : [
          { value: 0, short: 'Fail', label: 'Fail' },
          { value: 1, short: 'Pass', label: 'Pass' },
        ];
  const needsComment = isBelowFullMarks(criterion, entry.score);
  const choose = (score: number) => {
    onFocus();
    onChange({ ...entry, score });
  };
  const pickReason = (stockReason: string | null) =>
    onChange({ ...entry, stockReason, comment: commentAfterStockReason(entry.comment, entry.stockReason, stockReason) });
  const ref = useRef<View>(null);
  // Focus and the highlighted criterion are one cursor: j/k move focus here, and Tab into the
  // row (onFocus below) makes it the current one, so a digit scores what has focus.
  useEffect(() => {
    if (!current) return;
    const node = ref.current as unknown as HTMLElement | null;
    if (!node?.querySelector) return;
    node.scrollIntoView?.({ block: 'nearest' });
    if (!node.contains(document.activeElement))
      (node.querySelector<HTMLElement>('[role="radio"][aria-checked="true"], [role="radio"]') ?? node).focus();
  }, [current]);

  return (
    <View
      ref={ref}
      style={[styles.row, current && styles.current]}
      role="group"
      aria-label={criterion.title}
      aria-current={current ? 'step' : undefined}
      {...({ tabIndex: -1, onFocus } as object)}
    >
      <View style={styles.head}>
        <Text variant="label" style={{ flexShrink: 1 }}>
          {criterion.title}
        </Text>
        <View style={styles.badges}>
          {criterion.critical ? <Badge label="Critical" tone="fail" /> : null}
          <Badge label={`Weight ${criterion.weight}`} />
        </View>
      </View>
      <Text variant="muted">{criterion.guidance}</Text>
      {!applies ? (
        <Text style={{ fontFamily: fonts.semibold }}>Not applicable to this record: left out of the score.</Text>
      ) : (
        <>
          <View style={styles.choices} role="radiogroup" aria-label={`Score for ${criterion.title}`}>
            {choices.map((choice) => {
              const selected = entry.score === choice.value;
              return (
                <Pressable
                  key={choice.value}
                  role="radio"
                  aria-checked={selected}
                  accessibilityLabel={`${criterion.title}: ${choice.label}`}
                  onPress={() => choose(choice.value)}
                  {...chooseOnKeys(() => choose(choice.value))}
                  style={[styles.choice, selected && styles.choiceSelected]}
                >
                  <Text style={[styles.choiceText, selected && { color: colors.surface }]}>{choice.short}</Text>
                </Pressable>
              );
            })}
          </View>
          {carriedFrom ? (
            <Text
              variant="small"
              style={{ color: colors.rework }}
            >{`Carried over from revision ${carriedFrom}: its inputs did not change. Confirm or change it.`}</Text>
          ) : null}
          {entry.score !== undefined && entry.score !== null && criterion.scale.kind === 'levels' ? (
            <Text variant="small">{`${entry.score} of ${max}: ${criterion.scale.levels[entry.score]}`}</Text>
          ) : null}
          {needsComment ? (
            <>
              {criterion.stockReasons.length ? (
                <View style={styles.choices} role="radiogroup" aria-label={`Reason for ${criterion.title}`}>
                  {criterion.stockReasons.map((reason) => {
                    const selected = entry.stockReason === reason;
                    return (
                      <Pressable
                        key={reason}
                        role="radio"
                        aria-checked={selected}
                        accessibilityLabel={reason}
                        onPress={() => pickReason(selected ? null : reason)}
                        {...chooseOnKeys(() => pickReason(selected ? null : reason))}
                        style={[styles.reason, selected && styles.choiceSelected]}
                      >
                        <Text variant="small" style={selected ? { color: colors.surface } : undefined}>
                          {reason}
                        </Text>
                      </Pressable>
                    );
                  })}
                </View>
              ) : null}
              <TextInput
                accessibilityLabel={`Comment for ${criterion.title}`}
                placeholder="What falls short, and what the technician should do (required; a reason above fills it)"
                placeholderTextColor={colors.muted}
                value={entry.comment}
                onChangeText={(comment) => onChange({ ...entry, comment })}
                onFocus={onFocus}
                multiline
                style={[styles.comment, (error || !entry.comment.trim()) && styles.commentMissing]}
              />
            </>
          ) : null}
          {suggestions.length ? (
            <View style={styles.suggestions} role="note" aria-label={`Suggested comments for ${criterion.title}`}>
              <Text variant="label">From the station analysis (suggested, not scored):</Text>
              {suggestions.map((s) => (
                <Text key={s} variant="small">{`• ${s}`}</Text>
              ))}
              <Pressable
                role="button"
                accessibilityLabel={`Use the suggested comments for ${criterion.title}`}
                onPress={() => onChange({ ...entry, comment: [entry.comment.trim(), ...suggestions].filter(Boolean).join(' ') })}
              >
                <Text style={{ color: colors.accent, fontFamily: fonts.semibold }}>Use as comment</Text>
              </Pressable>
            </View>
          ) : null}
          {error ? (
            <Text role="alert" style={{ color: colors.fail }}>
              {error}
            </Text>
          ) : null}
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.xs, backgroundColor: colors.surface },
  current: { borderColor: colors.accent, borderWidth: 2 },
  head: { flexDirection: 'row', justifyContent: 'space-between', gap: space.sm, alignItems: 'center' },
  badges: { flexDirection: 'row', gap: space.xs },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  choice: {
    minWidth: 44,
    minHeight: 36,
    borderWidth: 1,
    borderColor: colors.ink,
    borderRadius: 4,
    alignItems: 'center',
    justifyContent: 'center',
    paddingHorizontal: space.sm,
  },
  choiceSelected: { backgroundColor: colors.ink },
  choiceText: { fontFamily: fonts.semibold, color: colors.ink },
  reason: { borderWidth: 1, borderColor: colors.muted, borderRadius: 12, paddingHorizontal: space.sm, paddingVertical: 4 },
  comment: {
    minHeight: 64,
    borderWidth: 1,
    borderColor: colors.muted,
    borderRadius: 6,
    padding: space.sm,
    fontFamily: fonts.regular,
    fontSize: 15,
    color: colors.ink,
    backgroundColor: colors.surface,
  },
  suggestions: { backgroundColor: colors.suggestion, borderRadius: 4, padding: space.sm, gap: 2 },
  commentMissing: { borderColor: colors.rework, borderWidth: 2 },
});
