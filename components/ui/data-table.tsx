// The table is loaded on first use: @tanstack/react-table is the largest library in the app,
// and the sign-in screen and the technician's phone screens never need it.
import type { RowData } from '@tanstack/react-table';
import { type ComponentType, lazy, Suspense } from 'react';

import type { DataTableProps } from './data-table-view';
import { Text } from './text';

export type { DataTableColumn, DataTableProps } from './data-table-view';

const DataTableView = lazy(() => import('./data-table-view'));

export function DataTable<T extends RowData>(props: DataTableProps<T>) {
  const View = DataTableView as unknown as ComponentType<DataTableProps<T>>;
  return (
    <Suspense fallback={<Text variant="muted">{`Loading ${props.label.toLowerCase()}…`}</Text>}>
      <View {...props} />
    </Suspense>
  );
}
