import { updateUserInput } from '@shared/schemas/auth';
import type { UserSummary } from '@shared/schemas/users';
import { useEffect } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useUpdateUser } from '@/features/users/api/mutations';
import { OrganisationSelect } from '@/features/users/components/organisation-select';
import { roleDescriptions, roleOptions } from '@/features/users/components/role-options';

/** The shared update schema plus the rule the database keeps: client users need an organisation. */
const editUserSchema = updateUserInput.refine((v) => v.role !== 'client' || Boolean(v.clientId), {
  message: 'Choose the organisation.',
  path: ['clientId'],
});

export function EditUserDialog({ user, onClose }: { user: UserSummary | null; onClose: () => void }) {
  return (
    <Dialog open={user !== null} onClose={onClose} title={user ? `Edit ${user.name}` : 'Edit'} description={user?.email}>
      {user ? <EditUserForm key={user.id} user={user} onDone={onClose} /> : null}
    </Dialog>
  );
}

function EditUserForm({ user, onDone }: { user: UserSummary; onDone: () => void }) {
  const update = useUpdateUser();
  const toast = useToast();
  const form = useZodForm(editUserSchema, {
    defaultValues: { name: user.name, role: user.role, clientId: user.clientId, phone: user.phone },
  });
  const role = form.watch('role') ?? user.role;

  useEffect(() => {
    if (role !== 'client') form.setValue('clientId', null);
  }, [role, form]);

  return (
    <Form
      form={form}
      aria-label={`Edit ${user.name}`}
      onSubmit={async (values) => {
        await update.mutateAsync({ id: user.id, ...values, clientId: values.role === 'client' ? values.clientId : null });
        toast(`${values.name ?? user.name} is saved.`);
        onDone();
      }}
    >
      <TextField name="name" label="Name" autoComplete="off" />
      <TextField name="phone" label="Phone" type="tel" autoComplete="off" hint="Optional. Shown to the office and on visit sheets." />
      <SelectField name="role" label="Role" options={roleOptions} hint={roleDescriptions[role].hint} />
      {role === 'client' ? <OrganisationSelect /> : null}
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
