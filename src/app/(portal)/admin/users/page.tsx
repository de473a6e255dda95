import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { requirePageRole } from '@/lib/auth/page-guard';
import { listUsers } from '@/lib/users/list-users';
import { InviteUserForm } from './invite-user-form';
import { RoleSelect } from './role-select';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersPage() {
  await requirePageRole(['admin'], '/admin/users');
  const users = await listUsers();
  return (
    <>
      <PageHeader eyebrow="Administration" title="Users and roles">Changing a role signs that user out; the new role applies at their next sign-in.</PageHeader>
      <div className="grid gap-10 lg:grid-cols-[2fr_1fr]">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Users</caption>
          <thead>
            <tr className="border-b border-paper-edge text-left text-ink-soft">
              <th scope="col" className="py-2 pr-3">Name</th>
              <th scope="col" className="py-2 pr-3">E-mail</th>
              <th scope="col" className="py-2 pr-3">Role</th>
              <th scope="col" className="py-2">Status</th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id} className="border-b border-paper-edge">
                <td className="py-2 pr-3">{u.name}</td>
                <td className="py-2 pr-3">{u.email}</td>
                <td className="py-2 pr-3"><RoleSelect userId={u.id} role={u.role} userName={u.name} /></td>
                <td className="py-2"><StatusLabel status={u.status} /></td>
              </tr>
            ))}
          </tbody>
        </table>
        <InviteUserForm />
      </div>
    </>
  );
}
