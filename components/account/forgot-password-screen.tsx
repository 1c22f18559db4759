import { Link } from 'expo-router';
import { useState } from 'react';

import { ApiError } from '@/components/lib/api-client';
import { usePasswordForgotMutation } from '@/components/queries/password';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, fonts } from '@/components/ui/theme';

import { PublicCard } from './public-card';

export function ForgotPasswordScreen() {
  const [email, setEmail] = useState('');
  const forgot = usePasswordForgotMutation();
  const fieldError = forgot.error instanceof ApiError ? forgot.error.fields.email : undefined;
  return (
    <PublicCard title="Forgot your password?">
      <Text variant="muted">
        Enter your work e-mail. If it has a Sightline account, a link to set a new password arrives within minutes.
      </Text>
      {forgot.isSuccess ? <Notice tone="info">{forgot.data.message}</Notice> : null}
      {forgot.error && !fieldError ? <Notice tone="error">{forgot.error.message}</Notice> : null}
      <TextField
        label="E-mail"
        autoCapitalize="none"
        inputMode="email"
        autoComplete="email"
        value={email}
        onChangeText={setEmail}
        error={fieldError}
      />
      <Button label="Send me a link" onPress={() => forgot.mutate(email)} busy={forgot.isPending} />
      <Link href="/sign-in" style={{ color: colors.accent, fontFamily: fonts.semibold }}>
        Back to sign-in
      </Link>
    </PublicCard>
  );
}
