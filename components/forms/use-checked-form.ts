import { type FieldValues, useForm, type UseFormProps, type UseFormReturn } from 'react-hook-form';
import { useUnsavedGuard } from './unsaved-guard';

export interface CheckedFormOptions {
  /** Ask before leaving while there are unsaved edits (off for sign-in, which holds no work). */
  guard?: boolean;
}

/**
 * Every Dilato form: a field's message shows as the person leaves it (then updates as they type),
 * and unsaved edits are not lost to a stray tap on another screen or a closed tab. Saving either
 * moves on in code (router.replace) or resets the form to what was saved, so only edits not yet
 * saved are guarded.
 */
export function useCheckedForm<TFieldValues extends FieldValues, TContext = unknown, TTransformedValues = TFieldValues>(
  props: UseFormProps<TFieldValues, TContext, TTransformedValues>,
  { guard = true }: CheckedFormOptions = {},
): UseFormReturn<TFieldValues, TContext, TTransformedValues> {
  const form = useForm<TFieldValues, TContext, TTransformedValues>({ mode: 'onTouched', ...props });
  useUnsavedGuard(guard && form.formState.isDirty);
  return form;
}
