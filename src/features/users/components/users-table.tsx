import type { UserSummary } from '@shared/schemas/users';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { Ellipsis, History, Mail, UserCheck, UserX, Users } from 'lucide-react';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import { Popover, popoverItemClasses } from '@/components/ui/popover';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useResendInvite, useUpdateUser } from '@/features/users/api/mutations';
import { EditUserDialog } from '@/features/users/components/edit-user-dialog';
import { roleDescriptions, roleOptions } from '@/features/users/components/role-options';
import { UserStatus, userStatusText } from '@/features/users/components/user-status';
import { errorMessage } from '@/lib/errors';
import { formatAgo, formatDate, formatDateTime } from '@/lib/format';
import { useUser } from '@/lib/session';
import { userQueries, type UserFilters } from '@/resources/users';

const column = createColumnHelper<UserSummary>();

/** The table's columns; `meId` marks the signed-in admin's own row. */
function userColumns(meId: string, onEdit: (user: UserSummary) => void, onToggle: (user: UserSummary) => void) {
  return [
    column.accessor('name', {
      header: 'Name',
      meta: { alwaysVisible: true, className: 'whitespace-nowrap' },
      cell: (c) => (
        <span className="font-medium text-ink-950">
          {c.getValue()}
          {c.row.original.id === meId ? <span className="ml-1.5 text-xs font-normal text-stone-500">(you)</span> : null}
        </span>
      ),
    }),
    column.accessor('email', {
      header: 'E-mail',
      meta: { className: 'whitespace-nowrap' },
      cell: (c) => <span className="text-stone-700">{c.getValue()}</span>,
    }),
    column.accessor('role', {
      header: 'Role',
      meta: { csv: (u) => roleDescriptions[u.role].label, className: 'whitespace-nowrap' },
      cell: (c) => <Badge tone={c.getValue() === 'client' ? 'neutral' : 'ink'}>{roleDescriptions[c.getValue()].label}</Badge>,
    }),
    column.accessor('clientName', {
      header: 'Organisation',
      meta: { className: 'min-w-[12rem]' },
      cell: (c) => c.getValue() ?? <span className="text-stone-500">—</span>,
    }),
    column.accessor('phone', { header: 'Phone', meta: { hiddenByDefault: true }, cell: (c) => c.getValue() || '—' }),
    column.display({
      id: 'status',
      header: 'Status',
      meta: { csv: (u) => userStatusText(u) },
      cell: (c) => <UserStatus user={c.row.original} />,
    }),
    column.accessor('lastSignInAt', {
      header: 'Last sign-in',
      meta: { csv: (u) => u.lastSignInAt ?? '', className: 'whitespace-nowrap' },
      cell: (c) => <span title={formatDateTime(c.getValue())}>{c.getValue() ? formatAgo(c.getValue()) : 'Never'}</span>,
    }),
    column.accessor('createdAt', {
      header: 'Added',
      meta: { hiddenByDefault: true },
      cell: (c) => formatDate(c.getValue()),
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      meta: { noCsv: true, alwaysVisible: true, align: 'right', className: 'w-px whitespace-nowrap' },
      cell: ({ row: { original: user } }) => <UserActions user={user} isMe={user.id === meId} onEdit={onEdit} onToggle={onToggle} />,
    }),
  ];
}

interface UsersTableProps {
  filters: UserFilters;
  onFiltersChange: (filters: UserFilters) => void;
}

export function UsersTable({ filters, onFiltersChange }: UsersTableProps) {
  const me = useUser();
  const query = useInfiniteQuery({ ...userQueries.list(filters), placeholderData: keepPreviousData });
  const [editing, setEditing] = useState<UserSummary | null>(null);
  const [toggling, setToggling] = useState<UserSummary | null>(null);
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);

  const columns = useMemo(() => userColumns(me.id, setEditing, setToggling), [me.id]);

  const filtered = Boolean(filters.q || filters.role);

  return (
    <>
      <DataTable
        tableId="users"
        label="People with a Gridkeep account"
        columns={columns}
        data={rows}
        getRowId={(u) => u.id}
        {...pagedQueryProps(query)}
        toolbar={
          <>
            <FilterSearch
              label="Search"
              placeholder="Name or e-mail"
              value={filters.q ?? ''}
              onChange={(q) => onFiltersChange({ ...filters, q: q || undefined })}
            />
            <FilterSelect
              label="Role"
              anyLabel="All roles"
              options={roleOptions}
              value={filters.role ?? ''}
              onChange={(role) => onFiltersChange({ ...filters, role: (role || undefined) as UserFilters['role'] })}
            />
          </>
        }
        empty={
          <EmptyState
            icon={Users}
            title={filtered ? 'No one matches these filters' : 'No accounts yet'}
            description={filtered ? 'Try another name, or clear the filters.' : 'Invite the first person with the button above.'}
          />
        }
      />
      <EditUserDialog user={editing} onClose={() => setEditing(null)} />
      <ToggleAccountDialog user={toggling} onClose={() => setToggling(null)} />
    </>
  );
}

interface UserActionsProps {
  user: UserSummary;
  /** The signed-in admin's own row: they cannot disable themselves. */
  isMe: boolean;
  onEdit: (user: UserSummary) => void;
  onToggle: (user: UserSummary) => void;
}

/** A row's actions: Edit, and a menu to re-send the invite, disable or enable, and see the account's history. */
function UserActions({ user, isMe, onEdit, onToggle }: UserActionsProps) {
  const resend = useResendInvite();
  const toast = useToast();
  return (
    <div className="-my-1 flex items-center justify-end gap-1">
      <Button size="sm" variant="ghost" onClick={() => onEdit(user)} aria-label={`Edit ${user.name}`}>
        Edit
      </Button>
      <Popover
        label={`Actions for ${user.name}`}
        trigger={(props) => (
          <Button {...props} size="sm" variant="ghost" aria-label={`More actions for ${user.name}`}>
            <Ellipsis className="h-4 w-4" aria-hidden="true" />
          </Button>
        )}
      >
        {(close) => (
          <>
            {user.invitePending && !user.disabled ? (
              <button
                type="button"
                className={popoverItemClasses}
                onClick={async () => {
                  close();
                  try {
                    await resend.mutateAsync(user.id);
                    toast(`Invitation sent again to ${user.email}.`);
                  } catch (error) {
                    toast(errorMessage(error), 'danger');
                  }
                }}
              >
                <Mail className="h-4 w-4 text-stone-500" aria-hidden="true" /> Re-send invite
              </button>
            ) : null}
            {!isMe ? (
              <button
                type="button"
                className={popoverItemClasses}
                onClick={() => {
                  close();
                  onToggle(user);
                }}
              >
                {user.disabled ? (
                  <UserCheck className="h-4 w-4 text-stone-500" aria-hidden="true" />
                ) : (
                  <UserX className="h-4 w-4 text-stone-500" aria-hidden="true" />
                )}
                {user.disabled ? 'Enable account' : 'Disable account'}
              </button>
            ) : null}
            <Link to={paths.admin.audit.getHref({ entity: 'user', entityId: user.id })} className={popoverItemClasses} onClick={close}>
              <History className="h-4 w-4 text-stone-500" aria-hidden="true" /> Account history
            </Link>
          </>
        )}
      </Popover>
    </div>
  );
}

/** Asks before disabling an account (signed out everywhere) or enabling it again. */
function ToggleAccountDialog({ user, onClose }: { user: UserSummary | null; onClose: () => void }) {
  const update = useUpdateUser();
  const toast = useToast();
  return (
    <ConfirmDialog
      open={user !== null}
      onClose={onClose}
      title={user?.disabled ? `Enable ${user?.name}?` : `Disable ${user?.name}?`}
      confirmLabel={user?.disabled ? 'Enable account' : 'Disable account'}
      tone={user?.disabled ? 'primary' : 'danger'}
      onConfirm={async () => {
        if (!user) return;
        await update.mutateAsync({ id: user.id, disabled: !user.disabled });
        toast(user.disabled ? `${user.name} can sign in again.` : `${user.name} can no longer sign in.`);
      }}
    >
      {user?.disabled ? (
        <p>They can sign in again with their existing password.</p>
      ) : (
        <p>They are signed out everywhere at once and cannot sign in until the account is enabled again. Their history stays.</p>
      )}
    </ConfirmDialog>
  );
}
