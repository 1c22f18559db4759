// A sortable table built on @tanstack/react-table (v9), rendered with react-native views so
// it works on phone and desktop. Where `cardsBelow` is set, a narrower screen gets a list of
// cards instead (one per row, every shown column as "label: value"); elsewhere a narrow
// screen scrolls the table sideways. `columnChoice` lets the person hide columns.
import {
  type ColumnDef,
  createSortedRowModel,
  flexRender,
  type RowData,
  rowSortingFeature,
  sortFns,
  type SortingState,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import { useEffect, useMemo, useRef, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';

import { chooseOnKeys } from '@/components/lib/press-keys';

import { Button } from './button';
import { ColumnChoice, useHiddenColumns } from './column-choice';
import { Select } from './select';
import { Text } from './text';
import { colors, fonts, space } from './theme';

export const dataTableFeatures = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns,
});

export type DataTableColumn<T extends RowData> = ColumnDef<typeof dataTableFeatures, T> & { meta?: { width?: number } };

export type DataTableProps<T extends RowData> = {
  label: string;
  columns: DataTableColumn<T>[];
  data: T[];
  emptyText: string;
  initialSorting?: SortingState;
  getRowId?: (row: T) => string;
  onRowPress?: (row: T) => void;
  // Keyboard focus on a row makes it the selected one, so shortcuts act on what has focus.
  onRowFocus?: (row: T) => void;
  // Server-side sorting: the parent owns the sort state and fetches rows in that order.
  sorting?: SortingState;
  onSortingChange?: (sorting: SortingState) => void;
  selectedRowId?: string | null;
  cardsBelow?: number;
  // Names a row's "Open" button on a card ("Open MRK-26-1001").
  rowLabel?: (row: T) => string;
  columnChoice?: { storageKey: string; hiddenByDefault: string[] };
};

const SORT_WORD = { asc: 'ascending', desc: 'descending' } as const;

export default function DataTableView<T extends RowData>({
  label,
  columns,
  data,
  emptyText,
  initialSorting = [],
  getRowId,
  onRowPress,
  onRowFocus,
  sorting: controlled,
  onSortingChange,
  selectedRowId,
  cardsBelow,
  rowLabel,
  columnChoice,
}: DataTableProps<T>) {
  const { width: screenWidth } = useWindowDimensions();
  const cards = cardsBelow !== undefined && screenWidth < cardsBelow;
  const { hidden, toggle } = useHiddenColumns(columnChoice?.storageKey, columnChoice?.hiddenByDefault ?? []);
  // Cards show every column: a phone has room down, not across.
  const shown = useMemo(
    () => (columnChoice && !cards ? columns.filter((c) => !hidden.includes(String(c.id))) : columns),
    [columns, columnChoice, cards, hidden],
  );
  const [localSorting, setLocalSorting] = useState<SortingState>(initialSorting);
  const sorting = controlled ?? localSorting;
  const setSorting = (updater: SortingState | ((old: SortingState) => SortingState)) => {
    const next = typeof updater === 'function' ? updater(sorting) : updater;
    if (onSortingChange) onSortingChange(next);
    else setLocalSorting(next);
  };
  const withTextCells = useMemo(
    () =>
      shown.map((column) =>
        column.cell ? column : { ...column, cell: (info: { getValue: () => unknown }) => plainCell(info.getValue()) },
      ),
    [shown],
  );
  const table = useTable({
    features: dataTableFeatures,
    columns: withTextCells as DataTableColumn<T>[],
    data,
    state: { sorting },
    onSortingChange: setSorting,
    manualSorting: Boolean(onSortingChange),
    getRowId: getRowId ? (row: T) => getRowId(row) : undefined,
  });

  // When j/k move the selection while the keyboard is in the table, focus follows it.
  const tableRef = useRef<View>(null);
  useEffect(() => {
    const node = tableRef.current as unknown as HTMLElement | null;
    if (!selectedRowId || !node?.querySelector || !node.contains(document.activeElement)) return;
    node.querySelector<HTMLElement>('[role="row"][aria-selected="true"]')?.focus();
  }, [selectedRowId]);

  const width = (meta: unknown) => (meta as { width?: number } | undefined)?.width ?? 160;

  if (cards) {
    const sortable = shown.filter((c) => c.enableSorting !== false).map((c) => ({ value: String(c.id), label: String(c.header) }));
    const current = sorting[0];
    return (
      <View style={{ gap: space.sm }}>
        {sortable.length ? (
          <View style={styles.sortBar}>
            <Select
              label="Sort by"
              value={current?.id ?? ''}
              allLabel="Default order"
              options={sortable}
              onChange={(id) => setSorting(id ? [{ id, desc: current?.id === id ? current.desc : false }] : [])}
            />
            {current ? (
              <Button
                label={current.desc ? 'Descending' : 'Ascending'}
                tone="secondary"
                onPress={() => setSorting([{ id: current.id, desc: !current.desc }])}
                accessibilityHint="Reverses the order"
              />
            ) : null}
          </View>
        ) : null}
        <View ref={tableRef} role="list" aria-label={label} style={{ gap: space.sm }}>
          {table.getRowModel().rows.length === 0 ? <Text variant="muted">{emptyText}</Text> : null}
          {table.getRowModel().rows.map((row) => {
            const [first, ...rest] = row.getAllCells();
            const body = (
              <>
                <View style={styles.cardTitle}>{renderCell(flexRender(first.column.columnDef.cell, first.getContext()), true)}</View>
                <View style={styles.cardFields}>
                  {rest.map((cell) => (
                    <View key={cell.id} style={styles.cardField}>
                      <Text variant="muted">{String(cell.column.columnDef.header)}</Text>
                      {renderCell(flexRender(cell.column.columnDef.cell, cell.getContext()))}
                    </View>
                  ))}
                </View>
              </>
            );
            const selected = selectedRowId === row.id;
            return (
              <View role="listitem" key={row.id} style={[styles.card, selected && styles.selected]}>
                {body}
                {/* A button of its own: a card may hold controls (tick boxes), which must not sit inside another control. */}
                {onRowPress ? (
                  <Button
                    label={rowLabel ? `Open ${rowLabel(row.original)}` : 'Open'}
                    tone="secondary"
                    onPress={() => onRowPress(row.original)}
                  />
                ) : null}
              </View>
            );
          })}
        </View>
      </View>
    );
  }

  const chooser = columnChoice ? (
    <ColumnChoice columns={columns.map((c) => ({ id: String(c.id), header: String(c.header) }))} hidden={hidden} onToggle={toggle} />
  ) : null;

  return (
    <View style={{ gap: space.sm }}>
      {chooser}
      <ScrollView horizontal contentContainerStyle={{ flexGrow: 1 }}>
        <View ref={tableRef} role="table" aria-label={label} style={styles.table}>
          {table.getHeaderGroups().map((group) => (
            <View role="row" key={group.id} style={[styles.row, styles.headerRow]}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const title = flexRender(header.column.columnDef.header, header.getContext());
                const canSort = header.column.getCanSort();
                return (
                  <View
                    role="columnheader"
                    key={header.id}
                    style={[styles.cell, { width: width(header.column.columnDef.meta) }]}
                    aria-sort={sorted ? SORT_WORD[sorted] : 'none'}
                  >
                    {canSort ? (
                      <Pressable
                        role="button"
                        accessibilityLabel={`Sort by ${String(header.column.columnDef.header)}`}
                        onPress={header.column.getToggleSortingHandler()}
                      >
                        <Text style={styles.headerText}>
                          {title}
                          {sorted === 'asc' ? ' ▲' : sorted === 'desc' ? ' ▼' : ''}
                        </Text>
                      </Pressable>
                    ) : (
                      <Text style={styles.headerText}>{title}</Text>
                    )}
                  </View>
                );
              })}
            </View>
          ))}
          {table.getRowModel().rows.length === 0 ? (
            <View role="row" style={styles.row}>
              <View role="cell" style={styles.cell}>
                <Text variant="muted">{emptyText}</Text>
              </View>
            </View>
          ) : (
            table.getRowModel().rows.map((row) => {
              const cells = row.getAllCells().map((cell) => (
                <View role="cell" key={cell.id} style={[styles.cell, { width: width(cell.column.columnDef.meta) }]}>
                  {renderCell(flexRender(cell.column.columnDef.cell, cell.getContext()))}
                </View>
              ));
              const selected = selectedRowId === row.id;
              return onRowPress ? (
                <Pressable
                  role="row"
                  key={row.id}
                  aria-selected={selected}
                  onPress={() => onRowPress(row.original)}
                  onFocus={() => onRowFocus?.(row.original)}
                  {...chooseOnKeys(() => onRowPress(row.original))}
                  style={(state) => [styles.row, selected && styles.selected, (state as { focused?: boolean }).focused && styles.focused]}
                >
                  {cells}
                </Pressable>
              ) : (
                <View role="row" key={row.id} style={styles.row}>
                  {cells}
                </View>
              );
            })
          )}
        </View>
      </ScrollView>
    </View>
  );
}

function plainCell(value: unknown, title = false) {
  return (
    <Text variant={title ? 'label' : 'small'} style={title ? { fontFamily: fonts.semibold } : undefined}>
      {value === null || value === undefined ? '' : String(value)}
    </Text>
  );
}

function renderCell(content: React.ReactNode, title = false) {
  return typeof content === 'string' || typeof content === 'number' ? plainCell(content, title) : content;
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, backgroundColor: colors.surface, minWidth: '100%' },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.line, minHeight: 44, alignItems: 'center' },
  headerRow: { backgroundColor: colors.paper },
  cell: { paddingHorizontal: space.md, paddingVertical: space.sm, flexGrow: 1 },
  headerText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  selected: { backgroundColor: colors.selectedRow, borderLeftWidth: 4, borderLeftColor: colors.accent },
  sortBar: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
  card: { borderWidth: 1, borderColor: colors.line, borderRadius: 8, backgroundColor: colors.surface, padding: space.md, gap: space.sm },
  cardTitle: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  cardFields: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.sm },
  cardField: { minWidth: 130, flexShrink: 1, gap: 2 },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
});
