'use client';
import { useEditorState } from '../editor-context';
import { TruckShape } from '../shapes/truck/truck-shape';
import { LoadRestShape } from '../shapes/load/load-shape';
import { TrailerShape } from '../shapes/trailer/trailer-shape';
import { ObstacleShape } from '../shapes/obstacle/obstacle-shape';
import { TapeShape } from '../shapes/tape/tape-shape';

/** Everything that stays put while the boom swings, in drawing order (ground first). */
export function SceneLayer() {
  const objects = useEditorState((s) => s.document.objects);
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
