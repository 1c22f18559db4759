import { Link, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { ApiError } from '@/components/lib/api-client';
import { usePasswordResetMutation } from '@/components/queries/password';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, fonts } from '@/components/ui/theme';

import { PublicCard } from './public-card';

// From an invitation or reset e-mail: the link carries a single-use token.
export function SetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [mismatch, setMismatch] = useState(false);
  const reset = usePasswordResetMutation();
  const fieldError = reset.error instanceof ApiError ? reset.error.fields.password : undefined;
  const submit = () => {
    setMismatch(password !== again);
    if (password === again && token) reset.mutate({ token, password });
  };
  if (reset.isSuccess) {
    return (
      <PublicCard title="Password set">
        <Notice tone="info">{`Your password is set. Sign in as ${reset.data.email}.`}</Notice>
        <Link href="/sign-in" style={{ color: colors.accent, fontFamily: fonts.semibold }}>
          Go to sign-in
        </Link>
      </PublicCard>
    );
  }
  return (
    <PublicCard title="Choose your password">
      <Text variant="muted">At least 12 characters. A short sentence you can remember works well; very common passwords are refused.</Text>
      {!token ? <Notice tone="error">This link is incomplete. Open the link from the e-mail again.</Notice> : null}
      {reset.error && !fieldError ? <Notice tone="error">{reset.error.message}</Notice> : null}
      <TextField
        label="New password"
        secureTextEntry
        autoComplete="new-password"
        value={password}
        onChangeText={setPassword}
        error={fieldError}
      />
      <TextField
        label="The same password again"
        secureTextEntry
        autoComplete="new-password"
        value={again}
        onChangeText={setAgain}
        error={mismatch ? 'The two passwords differ' : undefined}
      />
      <Button label="Set password" onPress={submit} busy={reset.isPending} disabled={!token} />
    </PublicCard>
  );
}
