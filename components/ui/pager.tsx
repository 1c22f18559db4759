import { StyleSheet, View } from 'react-native';

import { Button } from './button';
import { Text } from './text';
import { space } from './theme';

type Props = {
  page: number;
  pageSize: number;
  total: number;
  // Counting stopped at `total`: there are more pages than it shows.
  atLeast?: boolean;
  noun: string;
  onPage: (page: number) => void;
};

// Previous / next for a server-paged list, with where the reader is in words.
export function Pager({ page, pageSize, total, atLeast = false, noun, onPage }: Props) {
  const pages = pageCount(total, pageSize);
  const more = atLeast ? 'more than ' : '';
  return (
    <View style={styles.pager}>
      <Button label="Previous page" tone="secondary" disabled={page <= 1} onPress={() => onPage(page - 1)} />
      <Text>{`Page ${page} of ${more}${pages} · ${more}${total.toLocaleString('en-US')} ${noun}`}</Text>
      <Button label="Next page" tone="secondary" disabled={page >= pages && !atLeast} onPress={() => onPage(page + 1)} />
    </View>
  );
}

export const pageCount = (total: number, pageSize: number) => Math.max(1, Math.ceil(total / pageSize));

const styles = StyleSheet.create({ pager: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' } });
