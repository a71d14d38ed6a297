import { ForbiddenForRole } from '@/components/forbidden';

/** Any signed-in page that calls forbidden() without a more specific page of its own. */
export default function Forbidden() {
  return <ForbiddenForRole needs="other roles in your organisation" />;
}
