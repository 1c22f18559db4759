import { useState } from 'react';
import { View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { usePasswordChangeMutation } from '@/components/queries/password';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/ui/theme';

export function ChangePasswordScreen() {
  const [current, setCurrent] = useState('');
  const [next, setNext] = useState('');
  const change = usePasswordChangeMutation();
  const fields = change.error instanceof ApiError ? change.error.fields : {};
  return (
    <Screen title="Change password" subtitle="Your other signed-in devices are signed out when you change it">
      <View style={{ gap: space.md, maxWidth: 480 }} role="form" aria-label="Change password">
        {change.isSuccess ? <Notice tone="info">Password changed. Other devices must sign in again.</Notice> : null}
        {change.error && !Object.keys(fields).length ? <Notice tone="error">{change.error.message}</Notice> : null}
        <TextField
          label="Current password"
          secureTextEntry
          autoComplete="current-password"
          value={current}
          onChangeText={setCurrent}
          error={fields.currentPassword}
        />
        <TextField
          label="New password"
          hint="At least 12 characters; very common passwords are refused."
          secureTextEntry
          autoComplete="new-password"
          value={next}
          onChangeText={setNext}
          error={fields.newPassword}
        />
        <Button
          label="Change password"
          onPress={() => change.mutate({ currentPassword: current, newPassword: next })}
          busy={change.isPending}
        />
      </View>
    </Screen>
  );
}
