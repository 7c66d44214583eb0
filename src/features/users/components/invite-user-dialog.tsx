import { inviteUserInput } from '@shared/schemas/auth';
import { useEffect } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useInviteUser } from '@/features/users/api/mutations';
import { OrganisationSelect } from '@/features/users/components/organisation-select';
import { roleDescriptions, roleOptions } from '@/features/users/components/role-options';

export function InviteUserDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Invite a person"
      description="They get an e-mail with a link to choose a password. The link works once."
    >
      <InviteUserForm onDone={onClose} />
    </Dialog>
  );
}

function InviteUserForm({ onDone }: { onDone: () => void }) {
  const invite = useInviteUser();
  const toast = useToast();
  const form = useZodForm(inviteUserInput, {
    defaultValues: { email: '', name: '', role: 'technician', clientId: null },
  });
  const role = form.watch('role');

  // Staff have no organisation: forget a choice made while "client" was selected.
  useEffect(() => {
    if (role !== 'client') form.setValue('clientId', null);
  }, [role, form]);

  return (
    <Form
      form={form}
      aria-label="Invite a person"
      onSubmit={async (values) => {
        const user = await invite.mutateAsync({ ...values, clientId: values.role === 'client' ? values.clientId : null });
        toast(`Invitation sent to ${user.email}.`);
        onDone();
      }}
    >
      <TextField name="name" label="Name" autoComplete="off" autoFocus />
      <TextField name="email" label="E-mail address" type="email" autoComplete="off" inputMode="email" />
      <SelectField name="role" label="Role" options={roleOptions} hint={roleDescriptions[role ?? 'technician'].hint} />
      {role === 'client' ? <OrganisationSelect /> : null}
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Send invitation</SubmitButton>
      </DialogActions>
    </Form>
  );
}
