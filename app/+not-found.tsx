import { Link } from 'expo-router';
import { View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

export default function NotFound() {
  return (
    <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, backgroundColor: colors.paper }}>
      <Text variant="title" role="heading" aria-level={1}>
        Page not found
      </Text>
      <Link href="/" style={{ color: colors.accent, fontSize: 16 }}>
        Go to your home page
      </Link>
    </View>
  );
}
