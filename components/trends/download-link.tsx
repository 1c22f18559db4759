import { Linking, Pressable, StyleSheet } from 'react-native';
import Svg, { Path } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';

// A download arrow drawn as a shape: the text faces have no such character.
function DownloadIcon() {
  return (
    <Svg width={16} height={16} viewBox="0 0 16 16" aria-hidden>
      <Path
        d="M8 1.5v8.2M4.6 6.6 8 10l3.4-3.4M2.5 12.5v2h11v-2"
        stroke={colors.accent}
        strokeWidth={1.8}
        fill="none"
        strokeLinecap="round"
      />
    </Svg>
  );
}

export function DownloadLink({ path, search, label }: { path: string; search: string; label: string }) {
  return (
    <Pressable
      role="link"
      accessibilityLabel={label}
      onPress={() => void Linking.openURL(`${path}?${search}&format=csv`)}
      style={styles.link}
    >
      <DownloadIcon />
      <Text style={{ color: colors.accent, fontFamily: fonts.semibold }}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({ link: { flexDirection: 'row', alignItems: 'center', gap: space.xs } });
