import { buttonClasses, type ButtonSize, type ButtonVariant } from '@/components/ui/button';

/**
 * "Download plan (PDF)": a plain link to the plan document route, so the browser downloads it with the
 * session cookie. Without a revision the server picks the approved revision, else the latest.
 */
export function PlanDownloadLink({ sceneId, revision, variant = 'secondary', size = 'md', className }: { sceneId: number; revision?: number; variant?: ButtonVariant; size?: ButtonSize; className?: string }) {
  const href = `/api/scenes/${sceneId}/plan.pdf${revision ? `?revision=${revision}` : ''}`;
  return (
    <a href={href} download className={buttonClasses(variant, size, className)} data-testid="download-plan-pdf">
      Download plan (PDF)
    </a>
  );
}
