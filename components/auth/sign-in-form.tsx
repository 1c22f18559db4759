import { Link } from 'expo-router';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { useSignInMutation } from '@/components/queries/session';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { colors, fonts, space } from '@/components/ui/theme';

type Values = { email: string; password: string };

export function SignInForm() {
  const signIn = useSignInMutation();
  const { control, handleSubmit, setError, formState } = useForm<Values>({ defaultValues: { email: '', password: '' } });

  const submit = handleSubmit(async (values) => {
    try {
      await signIn.mutateAsync(values);
    } catch (error) {
      if (error instanceof ApiError) {
        for (const [field, message] of Object.entries(error.fields)) {
          if (field === 'email' || field === 'password') setError(field, { message });
        }
      }
    }
  });

  const serverMessage = signIn.error instanceof ApiError && Object.keys(signIn.error.fields).length === 0 ? signIn.error.message : null;

  return (
    <View style={styles.form} role="form" aria-label="Sign in">
      {serverMessage ? <Notice tone="error">{serverMessage}</Notice> : null}
      <Controller
        control={control}
        name="email"
        rules={{ required: 'Enter your e-mail address', pattern: { value: /^\S+@\S+\.\S+$/, message: 'Enter a valid e-mail address' } }}
        render={({ field, fieldState }) => (
          <TextField
            label="E-mail"
            nativeID="email"
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="password"
        rules={{ required: 'Enter your password' }}
        render={({ field, fieldState }) => (
          <TextField
            label="Password"
            nativeID="password"
            autoComplete="current-password"
            secureTextEntry
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            onSubmitEditing={submit}
            error={fieldState.error?.message}
          />
        )}
      />
      <Button label="Sign in" onPress={submit} busy={formState.isSubmitting} />
      <Link href="/forgot-password" style={{ color: colors.accent, fontFamily: fonts.semibold }}>
        Forgot your password?
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
