import { Linking, Pressable } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, fonts } from '@/components/ui/theme';

export function DownloadLink({ path, search, label }: { path: string; search: string; label: string }) {
  return (
    <Pressable role="link" accessibilityLabel={label} onPress={() => void Linking.openURL(`${path}?${search}&format=csv`)}>
      <Text style={{ color: colors.accent, fontFamily: fonts.semibold }}>{`⭳ ${label}`}</Text>
    </Pressable>
  );
}
