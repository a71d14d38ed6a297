'use client';
import Link from 'next/link';
import { useState } from 'react';
import { useEditorContext, useEditorState } from '../editor-context';
import { drawingAnalysis } from './revision-analysis';
import { planDrawing } from './plan-drawing';
import { planSvg, svgHeight } from './plan-svg';

/** Letter landscape less margins, points: the drawing exports at the same stated scale rules as the PDF. */
const EXPORT_BOX = { width: 720, height: 540 };
/** PNG pixels per point (about 200 dpi): sharp enough to print the drawing at its scale. */
const PNG_SCALE = 2.8;

const linkClass = 'flex min-h-11 items-center whitespace-nowrap rounded-md px-1.5 text-sm font-medium text-teal hover:bg-paper-sunk';

function save(blob: Blob, name: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

async function svgToPng(svg: string, width: number, height: number): Promise<Blob> {
  const img = new Image();
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('The drawing could not be turned into an image'));
      img.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * PNG_SCALE);
    canvas.height = Math.round(height * PNG_SCALE);
    const ctx = canvas.getContext('2d')!;
    ctx.fillStyle = '#FFFFFF';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('PNG export failed'))), 'image/png'));
  } finally {
    URL.revokeObjectURL(url);
  }
}

/**
 * The plan document and drawing exports: the PDF of the saved plan (the server computes it), the plan
 * details form, and the drawing of the sketch on screen as SVG or PNG from the same drawing model as the PDF.
 */
export function PlanExportMenu({ sceneId, title }: { sceneId: number; title: string }) {
  const { store } = useEditorContext();
  const ready = useEditorState((s) => !!s.analysis?.result && !!s.truck);
  const [problem, setProblem] = useState<string | null>(null);

  const drawing = () => {
    const s = store.getState();
    const result = s.analysis?.result;
    if (!result || !s.truck) return null;
    const live = drawingAnalysis(s.document, s.truck, result);
    const names = s.analysis?.lift.ok ? s.analysis.lift.names : {};
    return live ? planDrawing({ doc: s.document, model: s.truck, analysis: live, names, units: s.units, ...EXPORT_BOX }) : null;
  };
  const base = `${title.replace(/[^\w-]+/g, '-').replace(/-+/g, '-').slice(0, 60) || 'plan'}-drawing`;
  const exportSvg = () => {
    const d = drawing();
    if (!d) return setProblem('Place the truck and the load first.');
    save(new Blob([planSvg(d, title)], { type: 'image/svg+xml' }), `${base}.svg`);
  };
  const exportPng = async () => {
    const d = drawing();
    if (!d) return setProblem('Place the truck and the load first.');
    try {
      save(await svgToPng(planSvg(d, title), d.width, svgHeight(d)), `${base}.png`);
    } catch (e) {
      setProblem((e as Error).message);
    }
  };

  return (
    <div className="flex shrink-0 items-center" role="group" aria-label="Plan document">
      <a href={`/api/scenes/${sceneId}/plan.pdf`} download className={linkClass} data-testid="editor-download-plan" aria-label="Download plan (PDF)" title="The lift plan document of the saved plan (the approved revision if there is one, else the latest save)">
        Plan PDF
      </a>
      <Link href={`/scenes/${sceneId}/plan`} className={`${linkClass} hidden md:flex`} title="The job, people, weather, hazards and checklist the plan document carries">
        Plan details
      </Link>
      <button type="button" className={`${linkClass} hidden lg:flex`} disabled={!ready} onClick={exportSvg} title="The plan drawing of this sketch as SVG, to scale">
        SVG
      </button>
      <button type="button" className={`${linkClass} hidden lg:flex`} disabled={!ready} onClick={() => void exportPng()} title="The plan drawing of this sketch as a PNG image">
        PNG
      </button>
      {problem && (
        <span role="status" className="text-xs text-over">
          {problem}
        </span>
      )}
    </div>
  );
}
