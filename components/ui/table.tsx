import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export interface TableColumn<T> {
  key: string;
  header: string;
  /** Relative width of the column. */
  flex: number;
  render: (row: T) => ReactNode;
}

export interface TableProps<T> {
  columns: readonly TableColumn<T>[];
  rows: readonly T[];
  rowKey: (row: T) => string;
  label: string;
  testID: string;
  rowTestID?: string;
}

/** A simple data table for wide screens; phones show the same rows as cards instead. */
export function Table<T>({ columns, rows, rowKey, label, testID, rowTestID }: TableProps<T>) {
  const { colors } = useTheme();
  return (
    <View testID={testID} role="table" aria-label={label} style={[styles.table, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      <View role="row" style={[styles.row, { backgroundColor: colors.surfaceMuted }]}>
        {columns.map((column) => (
          <View key={column.key} role="columnheader" style={[styles.cell, { flex: column.flex }]}>
            <AppText variant="label" tone="muted">
              {column.header}
            </AppText>
          </View>
        ))}
      </View>
      {rows.map((row) => (
        <View key={rowKey(row)} role="row" testID={rowTestID} style={[styles.row, { borderTopColor: colors.border }, styles.bodyRow]}>
          {columns.map((column) => (
            <View key={column.key} role="cell" style={[styles.cell, { flex: column.flex }]}>
              {column.render(row)}
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: spacing.md },
  bodyRow: { borderTopWidth: 1, minHeight: 56 },
  cell: { paddingVertical: spacing.md, paddingHorizontal: spacing.sm, justifyContent: 'center' },
});
