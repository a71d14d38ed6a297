import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { Card, CardBody, CardHeader, FactList } from '@/components/ui/card';
import { UnitsForm } from '@/components/settings/units-form';
import { roleLabel } from '@/components/shell/app-shell';

export const metadata: Metadata = { title: 'Settings' };

export default async function SettingsPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  return (
    <>
      <PageHeader title="Settings" description="Your own preferences. They follow your account to any device." />
      <div className="flex flex-col gap-6">
        <Card>
          <CardHeader title="Units" />
          <CardBody>
            <UnitsForm current={user.units} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Your account" description="An administrator in your organisation changes these." />
          <CardBody>
            <FactList
              items={[
                { label: 'Name', value: user.name },
                { label: 'E-mail', value: user.email },
                { label: 'Role', value: roleLabel(user.role) },
                { label: 'Organisation', value: user.organisationName },
              ]}
            />
          </CardBody>
        </Card>
      </div>
    </>
  );
}
