import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listUsers } from '@/lib/users/list-users';
import { InviteUserForm } from './invite-user-form';
import { RoleSelect } from './role-select';
import { DataTable } from '@/components/ui/data-table';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersPage() {
  await requirePageRole(['admin'], '/admin/users');
  const users = await listUsers();
  return (
    <>
      <PageHeader eyebrow="Administration" title="Users and roles">Changing a role signs that user out; the new role applies at their next sign-in.</PageHeader>
      <div className="grid gap-10 lg:grid-cols-[2fr_1fr]">
        <DataTable caption="Users" columns={[{ label: 'Name' }, { label: 'E-mail' }, { label: 'Role' }, { label: 'Status' }]}>
          {users.map((u) => (
            <tr key={u.id} className="border-b border-paper-edge">
              <td className="py-2 pr-3">{u.name}</td>
              <td className="py-2 pr-3">{u.email}</td>
              <td className="py-2 pr-3"><RoleSelect userId={u.id} role={u.role} userName={u.name} /></td>
              <td className="py-2"><StatusLabel status={u.status} /></td>
            </tr>
          ))}
        </DataTable>
        <InviteUserForm />
      </div>
    </>
  );
}
