import type { Metadata } from 'next';
import { forbidden, redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { UsersTable } from '@/components/admin/users-table';
import { CreateUserForm } from '@/components/admin/create-user-form';
import { may } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersAdminPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  if (!may(user, 'manageUsers')) forbidden();
  return (
    <>
      <PageHeader eyebrow={user.organisationName} title="Users" description="Everyone who can sign in to your organisation, and their role." />
      <div className="grid grid-cols-1 items-start gap-6 2xl:grid-cols-[minmax(0,1fr)_22rem]">
        <UsersTable />
        <Card>
          <CardHeader title="Add a user" as="h2" />
          <CardBody>
            <CreateUserForm />
          </CardBody>
        </Card>
      </div>
    </>
  );
}
