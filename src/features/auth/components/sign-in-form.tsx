import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { signInInputSchema, type Me, type SignInInput } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { applyServerErrors } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';

interface SignInFormProps {
  onSignedIn: (user: Me) => void;
  /** Values to put in the form (a demo sign-in was picked); a new object fills again. */
  prefill?: SignInInput;
}

export function SignInForm({ onSignedIn, prefill }: SignInFormProps) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    setFocus,
    formState: { errors },
  } = useForm<SignInInput>({ resolver: zodResolver(signInInputSchema), defaultValues: { email: '', password: '' } });

  useEffect(() => {
    if (!prefill) return;
    setValue('email', prefill.email);
    setValue('password', prefill.password);
    setFormError(undefined);
    setFocus('password');
  }, [prefill, setValue, setFocus]);

  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    signIn.mutate(input, {
      onSuccess: onSignedIn,
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'password'])),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Sign in">
      {formError && <Notice tone="error" title="Could not sign in">{formError}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="username" inputMode="email" error={errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register('password')} />
      <Button type="submit" busy={signIn.isPending} className="mt-1 w-full">
        Sign in
      </Button>
    </form>
  );
}
