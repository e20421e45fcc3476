import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { createUserSchema, PASSWORD_MIN_LENGTH, type CreateUserInput } from '../../shared/schemas/users';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { ROLE_OPTIONS } from './role-options';
import { useCheckedForm } from '../forms/use-checked-form';

const FIELD_NAMES = ['name', 'email', 'role', 'password'] as const;

export interface CreateUserFormProps {
  /** Saves the new user; a rejection keeps everything typed and shows the server's messages. */
  onSubmit: (values: CreateUserInput) => Promise<unknown>;
}

export function CreateUserForm({ onSubmit }: CreateUserFormProps) {
  const [failure, setFailure] = useState<string>();
  const [created, setCreated] = useState<string>();
  const {
    control,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useCheckedForm<CreateUserInput>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { name: '', email: '', role: 'fabricator', password: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    setCreated(undefined);
    try {
      await onSubmit(values);
      reset();
      setCreated(`${values.name} can now sign in as ${values.email}.`);
    } catch (error) {
      const fields = isApiError(error) ? error.fields : {};
      let placed = false;
      for (const name of FIELD_NAMES) {
        if (fields[name]) {
          setError(name, { type: 'server', message: fields[name] });
          placed = true;
        }
      }
      if (!placed) setFailure(messageOf(error));
    }
  });

  return (
    <View style={styles.form}>
      {failure ? <ErrorBanner title="The user was not created" message={failure} /> : null}
      {created ? (
        <View accessible accessibilityRole="alert" aria-live="polite">
          <Text tone="success" variant="bodyStrong">
            {created}
          </Text>
        </View>
      ) : null}
      <Controller
        control={control}
        name="name"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField
            ref={ref}
            label="Name"
            value={value}
            onChangeText={onChange}
            onBlur={onBlur}
            error={errors.name?.message}
            autoComplete="off"
            autoCapitalize="words"
          />
        )}
      />
      <Controller
        control={control}
        name="email"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField
            ref={ref}
            label="Email"
            value={value}
            onChangeText={onChange}
            onBlur={onBlur}
            error={errors.email?.message}
            autoCapitalize="none"
            autoCorrect={false}
            autoComplete="off"
            keyboardType="email-address"
            inputMode="email"
          />
        )}
      />
      <Controller
        control={control}
        name="role"
        render={({ field: { onChange, value } }) => (
          <SegmentedControl
            label="Role"
            options={ROLE_OPTIONS}
            value={value}
            onChange={onChange}
            error={errors.role?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="password"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField
            ref={ref}
            label="Password"
            value={value}
            onChangeText={onChange}
            onBlur={onBlur}
            error={errors.password?.message}
            hint={`At least ${PASSWORD_MIN_LENGTH} characters. Pass it on in person; they can use it straight away.`}
            secureTextEntry
            autoComplete="new-password"
            textContentType="newPassword"
          />
        )}
      />
      <Button label="Create user" loading={isSubmitting} onPress={() => void submit()} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
});
