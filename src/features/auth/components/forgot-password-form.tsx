import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { passwordResetRequestInputSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/password-reset';

type ResetRequest = z.infer<typeof passwordResetRequestInputSchema>;

export function ForgotPasswordForm({ demoMode }: { demoMode: boolean }) {
  const request = useRequestPasswordReset();
  const [formError, setFormError] = useState<string>();
  const [sentTo, setSentTo] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ResetRequest>({ resolver: zodResolver(passwordResetRequestInputSchema), defaultValues: { email: '' } });

  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    request.mutate(input, {
      onSuccess: () => setSentTo(input.email),
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email'])),
    });
  });

  if (sentTo) {
    return (
      <Notice tone="success" title="Check your mail">
        <p>
          If <strong className="break-all">{sentTo}</strong> belongs to an active QuietLayer account, a link to set a new password is on its way. The link
          works once.
        </p>
        {demoMode && <p className="mt-2">Demo mode: the mail goes to the built-in local mail catcher; an administrator can read it on the Outbox page.</p>}
      </Notice>
    );
  }

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Notice tone="error" title="Could not send the link">{formError}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="username" inputMode="email" error={errors.email?.message} {...register('email')} />
      <Button type="submit" busy={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
