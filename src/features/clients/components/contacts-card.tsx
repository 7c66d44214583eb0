import { contactInput, contactPatch } from '@shared/schemas/clients';
import { Mail, Pencil, Phone, Trash2, UserPlus, Users } from 'lucide-react';
import { useState } from 'react';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Checkbox } from '@/components/ui/checkbox';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useCreateContact } from '@/features/clients/api/mutations';
import { useDeleteContact } from '@/features/clients/api/mutations';
import type { ClientUserOption, Contact } from '@shared/schemas/clients';
import { useUpdateContact } from '@/features/clients/api/mutations';

/** A contact as a list shows it; a site's page does not know whom a contact signs in as. */
export type ContactRow = Omit<Contact, 'clientId' | 'userId'> & { userId?: string | null };

interface ContactsCardProps {
  clientId: string;
  contacts: ContactRow[];
  /** On a site's page: new contacts belong to this site. */
  siteId?: string;
  /** On the client's page: the sites a contact can belong to (or the whole organisation). */
  sites?: { id: string; name: string }[];
  /** On the client's page (staff): the organisation's accounts a contact can sign in as. */
  users?: ClientUserOption[];
  canEdit: boolean;
  title?: string;
  description?: string;
}

/** The people to call and to keep informed, with add, edit and remove for the office. */
export function ContactsCard({ clientId, contacts, siteId, sites, users, canEdit, title = 'Contacts', description }: ContactsCardProps) {
  const [editing, setEditing] = useState<ContactRow | 'new' | null>(null);
  const [removing, setRemoving] = useState<ContactRow | null>(null);
  const remove = useDeleteContact();
  const toast = useToast();
  const siteName = (id: string | null) => (id ? (sites?.find((s) => s.id === id)?.name ?? 'This site') : null);
  const userName = (id: string | null | undefined) => (id ? users?.find((u) => u.id === id)?.name : undefined);

  return (
    <Card
      title={title}
      description={description}
      flush
      actions={
        canEdit ? (
          <Button size="sm" onClick={() => setEditing('new')} icon={<UserPlus className="h-4 w-4" aria-hidden="true" />}>
            Add contact
          </Button>
        ) : null
      }
    >
      {contacts.length === 0 ? (
        <EmptyState
          icon={Users}
          title="No contacts yet"
          description="Add the people who report faults, approve work or hold the keys."
          className="py-8"
        />
      ) : (
        <ul className="divide-y divide-stone-100">
          {contacts.map((c) => (
            <li key={c.id} className="flex flex-wrap items-start justify-between gap-3 px-4 py-3 sm:px-5">
              <div className="min-w-0 space-y-0.5">
                <p className="font-medium text-ink-950">
                  {c.name}
                  {c.title ? <span className="font-normal text-stone-600"> · {c.title}</span> : null}
                </p>
                <div className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
                  {c.email ? (
                    <a href={`mailto:${c.email}`} className="link inline-flex items-center gap-1">
                      <Mail className="h-3.5 w-3.5" aria-hidden="true" />
                      {c.email}
                    </a>
                  ) : null}
                  {c.phone ? (
                    <a href={`tel:${c.phone.replace(/[^\d+]/g, '')}`} className="link inline-flex items-center gap-1">
                      <Phone className="h-3.5 w-3.5" aria-hidden="true" />
                      {c.phone}
                    </a>
                  ) : null}
                </div>
                <div className="flex flex-wrap gap-1.5 pt-0.5">
                  {c.siteId ? <Badge tone="ink">{siteName(c.siteId)}</Badge> : sites || siteId ? <Badge>Whole organisation</Badge> : null}
                  {c.receivesUpdates ? <Badge tone="neutral">Gets e-mail updates</Badge> : null}
                  {userName(c.userId) ? <Badge tone="neutral">Signs in as {userName(c.userId)}</Badge> : null}
                </div>
              </div>
              {canEdit ? (
                <div className="flex shrink-0 gap-1">
                  <Button
                    size="sm"
                    variant="ghost"
                    onClick={() => setEditing(c)}
                    aria-label={`Edit ${c.name}`}
                    icon={<Pencil className="h-4 w-4" aria-hidden="true" />}
                  >
                    Edit
                  </Button>
                  <Button
                    size="sm"
                    variant="ghost"
                    onClick={() => setRemoving(c)}
                    aria-label={`Remove ${c.name}`}
                    icon={<Trash2 className="h-4 w-4" aria-hidden="true" />}
                  >
                    Remove
                  </Button>
                </div>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      <Dialog
        open={editing !== null}
        onClose={() => setEditing(null)}
        title={editing === 'new' ? 'Add a contact' : editing ? `Edit ${editing.name}` : 'Contact'}
      >
        {editing === 'new' ? (
          <CreateContactForm clientId={clientId} siteId={siteId} sites={sites} users={users} onDone={() => setEditing(null)} />
        ) : editing ? (
          <EditContactForm key={editing.id} contact={editing} sites={sites} users={users} onDone={() => setEditing(null)} />
        ) : null}
      </Dialog>
      <ConfirmDialog
        open={removing !== null}
        onClose={() => setRemoving(null)}
        title={`Remove ${removing?.name ?? 'this contact'}?`}
        confirmLabel="Remove contact"
        tone="danger"
        onConfirm={async () => {
          if (!removing) return;
          await remove.mutateAsync(removing.id);
          toast(`${removing.name} is removed.`);
        }}
      >
        <p>They will no longer be listed or receive e-mail updates. Tickets they opened keep their history.</p>
      </ConfirmDialog>
    </Card>
  );
}

const nullIfEmpty = { setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) };

function SiteChoice({ sites }: { sites?: { id: string; name: string }[] }) {
  if (!sites || sites.length === 0) return null;
  return (
    <SelectField
      name="siteId"
      label="Belongs to"
      placeholder="The whole organisation"
      options={sites.map((s) => ({ value: s.id, label: s.name }))}
      hint="A site's contact is shown on that site only; an organisation's contact on every site."
      registerOptions={nullIfEmpty}
    />
  );
}

/** Which of the client's accounts this contact signs in as: their replies are then never mailed back to them. */
function UserChoice({ users }: { users?: ClientUserOption[] }) {
  if (!users) return null;
  return (
    <SelectField
      name="userId"
      label="Signs in as"
      placeholder="Nobody"
      options={users.map((u) => ({ value: u.id, label: `${u.name} (${u.email})` }))}
      hint="The portal account of this person, if they have one. Their own replies are never e-mailed back to them."
      registerOptions={nullIfEmpty}
    />
  );
}

function ContactFields({ sites, users }: { sites?: { id: string; name: string }[]; users?: ClientUserOption[] }) {
  return (
    <>
      <TextField name="name" label="Name" autoComplete="off" />
      <TextField name="title" label="Role or title" autoComplete="off" hint="Optional, e.g. Facilities manager." />
      <TextField name="email" label="E-mail" type="email" inputMode="email" autoComplete="off" hint="Optional." />
      <TextField name="phone" label="Phone" type="tel" autoComplete="off" hint="Optional." />
      <SiteChoice sites={sites} />
      <UserChoice users={users} />
      <Checkbox name="receivesUpdates" label="Send ticket and visit updates by e-mail" hint="Needs an e-mail address." />
    </>
  );
}

function CreateContactForm({
  clientId,
  siteId,
  sites,
  users,
  onDone,
}: {
  clientId: string;
  siteId?: string;
  sites?: { id: string; name: string }[];
  users?: ClientUserOption[];
  onDone: () => void;
}) {
  const create = useCreateContact();
  const toast = useToast();
  const form = useZodForm(contactInput, {
    defaultValues: {
      clientId,
      siteId: siteId ?? null,
      name: '',
      title: '',
      email: '',
      phone: '',
      receivesUpdates: true,
      ...(users ? { userId: null } : {}),
    },
  });
  return (
    <Form
      form={form}
      aria-label="Add a contact"
      onSubmit={async (values) => {
        const contact = await create.mutateAsync(values);
        toast(`${contact.name} is added.`);
        onDone();
      }}
    >
      <ContactFields sites={sites} users={users} />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Add contact</SubmitButton>
      </DialogActions>
    </Form>
  );
}

function EditContactForm({
  contact,
  sites,
  users,
  onDone,
}: {
  contact: ContactRow;
  sites?: { id: string; name: string }[];
  users?: ClientUserOption[];
  onDone: () => void;
}) {
  const update = useUpdateContact();
  const toast = useToast();
  const form = useZodForm(contactPatch, {
    defaultValues: {
      siteId: contact.siteId,
      name: contact.name,
      title: contact.title,
      email: contact.email ?? '',
      phone: contact.phone,
      receivesUpdates: contact.receivesUpdates,
      ...(users ? { userId: contact.userId ?? null } : {}),
    },
  });
  return (
    <Form
      form={form}
      aria-label={`Edit ${contact.name}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: contact.id, ...values });
        toast(`${saved.name} is saved.`);
        onDone();
      }}
    >
      <ContactFields sites={sites} users={users} />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save changes</SubmitButton>
      </DialogActions>
    </Form>
  );
}
