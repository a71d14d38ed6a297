'use client';
import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import type { TruckObject } from '@/lib/scene/objects';
import { useEditorState } from '../editor-context';
import { useEnvelopeState } from './reach-envelope-store';
import type { EnvelopePicture } from './envelope-picture';

export { ENVELOPE_STYLE } from './envelope-picture';

/** The bitmap last drawn: once a newer one has been drawn it is never drawn again, so its memory is let go at once. */
let lastDrawn: EnvelopePicture['image'] = null;

/**
 * The reach envelope on the plan, drawn round the truck where it stands now (the envelope is in its own
 * frame). Per frame this is one drawImage of the bitmap the worker painted (use-reach-envelope.ts).
 */
export function ReachEnvelopeOverlay() {
  const on = useEnvelopeState((s) => s.on);
  const picture = useEnvelopeState((s) => (s.grid ? s.picture : null));
  const truck = useEditorState((s) => s.document.objects.find((o): o is TruckObject => o.kind === 'truck'));
  if (!on || !picture?.image || !picture.box || !truck) return null;
  const { image, box } = picture;
  const heading = (truck.rotation * Math.PI) / 180;
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(ctx: Context) => {
        const c = ctx._context;
        c.save();
        c.translate(truck.x, truck.y);
        c.rotate(heading);
        c.imageSmoothingEnabled = true;
        c.drawImage(image, box.x0, box.y0, box.x1 - box.x0, box.y1 - box.y0);
        c.restore();
        if (lastDrawn !== image) {
          if (lastDrawn && 'close' in lastDrawn) lastDrawn.close();
          lastDrawn = image;
        }
      }}
    />
  );
}
