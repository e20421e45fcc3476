import { zodResolver } from '@hookform/resolvers/zod';
import { useRef } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, type TextInput, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { signInSchema, type SignInInput } from '../../shared/schemas/auth';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { TextField } from '../ui/text-field';

export interface SignInFormProps {
  onSubmit: (values: SignInInput) => void;
  submitting: boolean;
  /** The server's message when sign-in failed as a whole (wrong password, too many attempts). */
  failure?: string;
  /** Field messages from the server, shown under their fields. */
  serverFields?: Record<string, string>;
}

export function SignInForm({ onSubmit, submitting, failure, serverFields = {} }: SignInFormProps) {
  const passwordRef = useRef<TextInput>(null);
  const {
    control,
    handleSubmit,
    formState: { errors },
  } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });
  const submit = handleSubmit(onSubmit);

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
            onChangeText={onChange}
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
            onChangeText={onChange}
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
