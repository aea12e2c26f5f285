'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { invitePerson } from '@/lib/server/admin/invite-person';
import { inviteSchema } from '@/lib/validation/auth';
import { RoleCheckboxes } from './role-checkboxes';

type Input = z.input<typeof inviteSchema>;
type Output = z.output<typeof inviteSchema>;

export function InviteForm() {
  const { register, control, handleSubmit, reset, setError, formState: { errors, isSubmitting } } = useForm<Input, unknown, Output>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: '', name: '', roles: [] },
  });

  const onSubmit = handleSubmit(async (values) => {
    const result = await invitePerson(values);
    if (result.ok) {
      toast.success(`Invitation sent to ${values.email}`);
      reset();
      return;
    }
    for (const [field, message] of Object.entries(result.fieldErrors ?? {})) {
      if (field === 'email' || field === 'name' || field === 'roles') setError(field, { message });
    }
    if (!result.fieldErrors) toast.error(result.message);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="card space-y-4 p-4" aria-label="Invite a person">
      <h2 className="text-title">Invite a person</h2>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="invite-name" className="field-label">Name</label>
          <input id="invite-name" className="field-input" aria-invalid={Boolean(errors.name)} {...register('name')} />
          {errors.name ? <p className="field-error">{errors.name.message}</p> : null}
        </div>
        <div>
          <label htmlFor="invite-email" className="field-label">E-mail</label>
          <input id="invite-email" type="email" className="field-input" aria-invalid={Boolean(errors.email)} {...register('email')} />
          {errors.email ? <p className="field-error">{errors.email.message}</p> : null}
        </div>
      </div>
      <div>
        <p className="field-label">Roles</p>
        <Controller control={control} name="roles"
          render={({ field }) => <RoleCheckboxes idPrefix="invite-role" value={field.value ?? []} onChange={field.onChange} />} />
        {errors.roles ? <p className="field-error">{errors.roles.message}</p> : null}
      </div>
      <button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Sending…' : 'Send invitation'}</button>
    </form>
  );
}
