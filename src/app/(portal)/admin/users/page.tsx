import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listPendingInvitations, listUsers } from '@/lib/users/list-users';
import { AccountSwitch } from './account-switch';
import { InvitationList } from './invitation-list';
import { InviteUserForm } from './invite-user-form';
import { RoleSelect } from './role-select';
import { DataTable } from '@/components/ui/data-table';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersPage() {
  await requirePageRole(['admin'], '/admin/users');
  const users = await listUsers();
  const invitations = await listPendingInvitations();
  return (
    <>
      <PageHeader eyebrow="Administration" title="Users and roles">Changing a role, or deactivating an account, signs that user out; a new role applies at their next sign-in. A deactivated user cannot sign in; what they did stays on record.</PageHeader>
      <div className="grid gap-10 lg:grid-cols-[2fr_1fr]">
        <DataTable caption="Users" columns={[{ label: 'Name' }, { label: 'E-mail' }, { label: 'Role' }, { label: 'Status' }, { label: 'Account' }]}>
          {users.map((u) => (
            <tr key={u.id} className="border-b border-paper-edge">
              <td className="py-2 pr-3">{u.name}</td>
              <td className="py-2 pr-3">{u.email}</td>
              <td className="py-2 pr-3"><RoleSelect userId={u.id} role={u.role} userName={u.name} /></td>
              <td className="py-2 pr-3"><StatusLabel status={u.status === 'disabled' ? 'deactivated' : u.status} /></td>
              <td className="py-2"><AccountSwitch userId={u.id} userName={u.name} status={u.status} /></td>
            </tr>
          ))}
        </DataTable>
        <div>
          <InviteUserForm />
          <InvitationList invitations={invitations} />
        </div>
      </div>
    </>
  );
}
