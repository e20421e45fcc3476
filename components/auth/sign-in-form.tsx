import { zodResolver } from '@hookform/resolvers/zod';
import { useRef } from 'react';
import { Controller } from 'react-hook-form';
import { StyleSheet, type TextInput, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { signInSchema, type SignInInput } from '../../shared/schemas/auth';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';

export interface SignInFormProps {
  onSubmit: (values: SignInInput) => void;
  submitting: boolean;
  /** The server's message when sign-in failed as a whole (wrong password, too many attempts). */
  failure?: string;
  /** Field messages from the server, shown under their fields. */
  serverFields?: Record<string, string>;
  /** Called as the person changes a field or the form finds a field error, so a stale failure goes. */
  onEdit?: () => void;
}

export function SignInForm({ onSubmit, submitting, failure, serverFields = {}, onEdit }: SignInFormProps) {
  const passwordRef = useRef<TextInput>(null);
  const {
    control,
    handleSubmit,
    formState: { errors },
  } = useCheckedForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  }, { guard: false });
  const submit = handleSubmit(onSubmit, () => onEdit?.());

  return (
    <View style={styles.form}>
      {failure ? <ErrorBanner message={failure} /> : null}
      <Controller
        control={control}
        name="email"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField
            ref={ref}
            label="Email"
            value={value}
            onChangeText={(text) => {
              onEdit?.();
              onChange(text);
            }}
            onBlur={onBlur}
            error={errors.email?.message ?? serverFields.email}
            autoCapitalize="none"
            autoCorrect={false}
            autoComplete="email"
            keyboardType="email-address"
            inputMode="email"
            textContentType="username"
            returnKeyType="next"
            onSubmitEditing={() => passwordRef.current?.focus()}
          />
        )}
      />
      <Controller
        control={control}
        name="password"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField
            ref={(node) => {
              passwordRef.current = node;
              ref(node);
            }}
            label="Password"
            value={value}
            onChangeText={(text) => {
              onEdit?.();
              onChange(text);
            }}
            onBlur={onBlur}
            error={errors.password?.message ?? serverFields.password}
            secureTextEntry
            autoCapitalize="none"
            autoComplete="current-password"
            textContentType="password"
            returnKeyType="go"
            onSubmitEditing={() => void submit()}
          />
        )}
      />
      <Button label="Sign in" loading={submitting} onPress={() => void submit()} fullWidth />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
});
