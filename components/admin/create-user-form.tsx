import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { type NewUser, useUserCreateMutation } from '@/components/queries/users';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { type Role, ROLE_LABELS, ROLES } from '@/shared/roles';

const roleOptions = ROLES.map((value) => ({ value, label: ROLE_LABELS[value] }));

export function CreateUserForm() {
  const create = useUserCreateMutation();
  const { control, handleSubmit, setError, reset } = useForm<NewUser>({
    defaultValues: { name: '', email: '', role: 'technician' },
  });

  const submit = handleSubmit(async (values) => {
    try {
      await create.mutateAsync(values);
      reset();
    } catch (error) {
      if (error instanceof ApiError) {
        for (const [field, message] of Object.entries(error.fields)) setError(field as keyof NewUser, { message });
      }
    }
  });

  return (
    <View style={styles.card} role="form" aria-label="Add a user">
      <Text variant="heading">Add a user</Text>
      {create.isSuccess ? (
        <Notice tone="info">{`Added ${create.data.user.name}. An invitation e-mail with a link to choose a password is on its way.`}</Notice>
      ) : null}
      <Text variant="muted">The new person chooses their own password from the invitation e-mail; nobody else ever knows it.</Text>
      {create.error instanceof ApiError && Object.keys(create.error.fields).length === 0 ? (
        <Notice tone="error">{create.error.message}</Notice>
      ) : null}
      <Controller
        control={control}
        name="name"
        rules={{ required: 'Enter a name' }}
        render={({ field, fieldState }) => (
          <TextField label="Full name" value={field.value} onChangeText={field.onChange} error={fieldState.error?.message} />
        )}
      />
      <Controller
        control={control}
        name="email"
        rules={{ required: 'Enter an e-mail address' }}
        render={({ field, fieldState }) => (
          <TextField
            label="E-mail"
            autoCapitalize="none"
            inputMode="email"
            value={field.value}
            onChangeText={field.onChange}
            error={fieldState.error?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="role"
        render={({ field, fieldState }) => (
          <ChoiceField<Role>
            label="Role"
            options={roleOptions}
            value={field.value}
            onChange={field.onChange}
            error={fieldState.error?.message}
          />
        )}
      />
      <Button label="Add user" onPress={submit} busy={create.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.md },
});
