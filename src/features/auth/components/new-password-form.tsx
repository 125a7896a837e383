import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { applyServerErrors } from '../../../lib/form-errors';
import { newPasswordFormSchema, type NewPasswordForm } from './new-password-schema';

interface NewPasswordFormProps {
  submitLabel: string;
  /** Sends the password; a rejection with field errors shows them beside the field. */
  onSubmitPassword: (password: string) => Promise<unknown>;
  busy: boolean;
}

export function NewPasswordFields({ submitLabel, onSubmitPassword, busy }: NewPasswordFormProps) {
  const [formError, setFormError] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<NewPasswordForm>({ resolver: zodResolver(newPasswordFormSchema), defaultValues: { password: '', confirmPassword: '' } });

  const onSubmit = handleSubmit(async ({ password }) => {
    setFormError(undefined);
    try {
      await onSubmitPassword(password);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password']));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Notice tone="error" title="Password not set">{formError}</Notice>}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A short sentence is easy to remember and hard to guess.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField label="Repeat the password" type="password" autoComplete="new-password" error={errors.confirmPassword?.message} {...register('confirmPassword')} />
      <Button type="submit" busy={busy} className="w-full">
        {submitLabel}
      </Button>
    </form>
  );
}
