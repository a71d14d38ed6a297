import { ForbiddenForRole } from '@/components/forbidden';

/** Shown with a 403 status when the review queue calls forbidden(). */
export default function Forbidden() {
  return <ForbiddenForRole needs="supervisors and administrators" />;
}
