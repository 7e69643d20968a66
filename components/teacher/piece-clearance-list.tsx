import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { PieceClearanceView } from '@/shared/schemas/clearance';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';
import { ClearanceMark } from './clearance-mark';
import { PassageLines } from './passage-lines';
import { PieceCard } from './piece-card';
import { PieceTitle } from './piece-title';

const columnsAsOf = (asOf: string): TableColumn<PieceClearanceView>[] => [
  { key: 'piece', header: 'Piece', flex: 3, render: (piece) => <PieceTitle piece={piece} /> },
  {
    key: 'piece-status',
    header: 'Whole piece',
    flex: 2.5,
    render: (piece) => <ClearanceMark cleared={piece.cleared} expectedOn={piece.expectedOn} asOf={asOf} />,
  },
  { key: 'passages', header: 'Demanding passages', flex: 3, render: (piece) => <PassageLines passages={piece.passages} asOf={asOf} /> },
];

export interface PieceClearanceListProps {
  pieces: readonly PieceClearanceView[];
  asOf: string;
  label: string;
  empty: string;
  testID: string;
}

/** Pieces as a table on a wide screen and as cards on a phone. */
export function PieceClearanceList({ pieces, asOf, label, empty, testID }: PieceClearanceListProps) {
  const { isMedium } = useBreakpoints();
  if (pieces.length === 0) {
    return (
      <AppText tone="muted" testID={`${testID}-empty`}>
        {empty}
      </AppText>
    );
  }
  if (isMedium) {
    return (
      <Table
        testID={testID}
        rowTestID={`${testID}-row`}
        label={label}
        columns={columnsAsOf(asOf)}
        rows={pieces}
        rowKey={(piece) => `${piece.title}|${piece.composer}`}
      />
    );
  }
  return (
    <View style={styles.cards} testID={testID}>
      {pieces.map((piece) => (
        <PieceCard key={`${piece.title}|${piece.composer}`} piece={piece} asOf={asOf} testID={`${testID}-row`} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ cards: { gap: spacing.md } });
