import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { roleLabels, roleValues } from '../../../../shared/schemas/roles';
import { inviteUserInputSchema, type InviteUserInput } from '../../../../shared/schemas/users';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { applyServerErrors } from '../../../lib/form-errors';
import { useInviteUser } from '../api/invite-user';

const emptyInvite: InviteUserInput = { email: '', displayName: '', role: 'technician' };

/** Invite by e-mail; the same schema as the server, and the server's field errors beside the fields. */
export function InviteUserForm() {
  const invite = useInviteUser();
  const [formError, setFormError] = useState<string>();
  const [invited, setInvited] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<InviteUserInput>({ resolver: zodResolver(inviteUserInputSchema), defaultValues: emptyInvite });

  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    setInvited(undefined);
    invite.mutate(input, {
      onSuccess: (invitation) => {
        setInvited(`${invitation.displayName} <${invitation.email}>`);
        reset(emptyInvite);
      },
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'displayName', 'role'])),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-labelledby="invite-title" className="flex flex-col gap-4 rounded-md border border-slate-line bg-paper-raised p-5">
      <div>
        <h2 id="invite-title" className="text-lg font-semibold">
          Invite someone
        </h2>
        <p className="text-sm text-ink-soft">They get an e-mail with a link to set their own password. The link works once.</p>
      </div>
      {invited && (
        <Notice tone="success" title="Invitation sent">
          <span className="break-all">{invited}</span> can now set a password from the e-mail.
        </Notice>
      )}
      {formError && <Notice tone="error" title="Invitation not sent">{formError}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="off" inputMode="email" error={errors.email?.message} {...register('email')} />
      <TextField label="Name" autoComplete="off" hint="As it should appear on checks and signatures." error={errors.displayName?.message} {...register('displayName')} />
      <Field label="Role" error={errors.role?.message}>
        {({ id, describedBy, invalid }) => (
          <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} {...register('role')}>
            {roleValues.map((role) => (
              <option key={role} value={role}>
                {roleLabels[role]}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Button type="submit" busy={invite.isPending}>
        Send invitation
      </Button>
    </form>
  );
}
