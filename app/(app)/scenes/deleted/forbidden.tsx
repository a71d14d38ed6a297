import { ForbiddenForRole } from '@/components/forbidden';

/** Shown with a 403 status when the page calls forbidden(). */
export default function Forbidden() {
  return <ForbiddenForRole needs="administrators" />;
}
