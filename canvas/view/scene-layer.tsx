'use client';
import { useMemo } from 'react';
import { useEditorState } from '../editor-context';
import { TruckShape } from '../shapes/truck/truck-shape';
import { LoadRestShape } from '../shapes/load/load-shape';
import { TrailerShape } from '../shapes/trailer/trailer-shape';
import { ObstacleShape } from '../shapes/obstacle/obstacle-shape';
import { TapeShape } from '../shapes/tape/tape-shape';
import type { EditorState } from '../store/types';
import type { SceneObject } from '@/lib/scene/objects';

/**
 * Ids of the objects the gesture in progress has moved or reshaped, one per line ('' outside a gesture).
 * They are drawn on the live layer until the gesture ends, so a drag redraws the few objects it moves
 * and not every obstacle on the scene's canvas. A truck whose boom alone changed stays: its body does not.
 */
export function movingIds(s: EditorState): string {
  const base = s.gestureBase;
  if (!base || base === s.document) return '';
  const before = new Map(base.objects.map((o) => [o.id, o]));
  let ids = '';
  for (const o of s.document.objects) {
    const b = before.get(o.id);
    if (b === o) continue;
    if (b && b.kind === 'truck' && o.kind === 'truck' && b.x === o.x && b.y === o.y && b.rotation === o.rotation && b.legs === o.legs && b.profileId === o.profileId && b.profileVersion === o.profileVersion) continue;
    ids += `${o.id}\n`;
  }
  return ids;
}

/** Scene objects in drawing order (ground first), with the editor's own shapes. */
export function SceneObjects({ objects }: { objects: SceneObject[] }) {
  const model = useEditorState((s) => s.truck);
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  return (
    <>
      {objects.map((o) => (o.kind === 'obstacle' && o.obstacleKind === 'traffic-lane' ? <ObstacleShape key={o.id} obstacle={o} /> : null))}
      {objects.map((o) => (o.kind === 'trailer' ? <TrailerShape key={o.id} trailer={o} /> : null))}
      {objects.map((o) => (o.kind === 'obstacle' && o.obstacleKind !== 'traffic-lane' ? <ObstacleShape key={o.id} obstacle={o} pxPerM={pxPerM} /> : null))}
      {objects.map((o) => (o.kind === 'load' ? <LoadRestShape key={o.id} load={o} /> : null))}
      {objects.map((o) => (o.kind === 'truck' && model ? <TruckShape key={o.id} truck={o} model={model} /> : null))}
      {objects.map((o) => (o.kind === 'tape' ? <TapeShape key={o.id} tape={o} pxPerM={pxPerM} /> : null))}
    </>
  );
}

/**
 * Everything that stays put while the boom swings or an object is dragged. During a gesture it draws the
 * objects as the gesture found them, less the moving ones: that list does not change from frame to frame,
 * so neither React nor Konva touches the scene's canvas until the gesture ends.
 */
export function SceneLayer() {
  const objects = useEditorState((s) => (s.gestureBase ?? s.document).objects);
  const moving = useEditorState(movingIds);
  const shown = useMemo(() => {
    if (!moving) return objects;
    const ids = new Set(moving.split('\n'));
    return objects.filter((o) => !ids.has(o.id));
  }, [objects, moving]);
  return <SceneObjects objects={shown} />;
}

/** The objects a gesture is moving, drawn on the live layer while it lasts (see movingIds). */
export function MovingObjects() {
  const objects = useEditorState((s) => s.document.objects);
  const moving = useEditorState(movingIds);
  if (!moving) return null;
  const ids = new Set(moving.split('\n'));
  return <SceneObjects objects={objects.filter((o) => ids.has(o.id))} />;
}
