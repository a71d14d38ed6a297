import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { planRevisionQuery } from '@/lib/validations/plan';
import { renderPlanPdf } from '@/components/plan-pdf/render';
import { planNumber } from '@/components/plan-pdf/page-frame';
import { loadPlanData } from '../load-plan';

export const runtime = 'nodejs';

/**
 * The lift plan as a PDF for one saved revision (default: the approved revision, else the latest), in the
 * viewer's units with the other system in brackets. Anyone who may read the scene may download it.
 */
export const GET = route({ params: idParams, query: planRevisionQuery }, async ({ user, params, query }) => {
  const data = await loadPlanData(getDb(), user, params.id, query.revision);
  const pdf = await renderPlanPdf(data);
  const name = `lift-plan-${planNumber(data.meta)}-rev${data.meta.revision}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${name}"`,
      'content-length': String(pdf.length),
      'cache-control': 'private, no-store',
    },
  });
});
