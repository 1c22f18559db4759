import { Text } from './text';
import { colors, fonts } from './theme';

// The message under a field that failed validation; announced by screen readers.
export function FieldError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <Text role="alert" style={{ color: colors.fail, fontFamily: fonts.semibold, fontSize: 14 }}>
      {message}
    </Text>
  );
}
