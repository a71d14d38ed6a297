import { createElement } from 'react';
import { renderToBuffer, type DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { registerPdfFonts } from './fonts';
import { PlanDocument } from './plan-document';
import type { PlanData } from './plan-data';

/** Renders the plan document to PDF bytes (server only). */
export async function renderPlanPdf(d: PlanData): Promise<Buffer> {
  registerPdfFonts();
  return renderToBuffer(createElement(PlanDocument, { d }) as unknown as ReactElement<DocumentProps>);
}
