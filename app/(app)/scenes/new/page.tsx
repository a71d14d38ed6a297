import type { Metadata } from 'next';
import { forbidden, redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { Card, CardBody } from '@/components/ui/card';
import { NewSceneForm } from '@/components/scenes/new-scene-form';
import { may } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'New scene' };

export default async function NewScenePage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  // Only operators create scenes (POST /api/scenes enforces the same).
  if (!may(user, 'createScene')) forbidden();
  return (
    <>
      <PageHeader eyebrow="Scenes" title="New scene" description="Name the job and, if you know it, the truck. The sketch itself is drawn in the editor." />
      <Card className="max-w-2xl">
        <CardBody className="py-6">
          <NewSceneForm />
        </CardBody>
      </Card>
    </>
  );
}
