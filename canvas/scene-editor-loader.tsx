'use client';
import dynamic from 'next/dynamic';
import type { SceneEditorProps } from './scene-editor';

/** Konva needs the browser: the editor is loaded on the client only. */
const SceneEditor = dynamic(() => import('./scene-editor').then((m) => m.SceneEditor), {
  ssr: false,
  loading: () => (
    <div className="flex h-full items-center justify-center text-ink-soft" role="status">
      Opening the sketch…
    </div>
  ),
});

export function SceneEditorLoader(props: SceneEditorProps) {
  return <SceneEditor {...props} />;
}
