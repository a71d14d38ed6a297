'use client';

import { useEffect, useState } from 'react';
import { Image as KonvaImage } from 'react-konva';
import type { BackgroundPlacement } from './calibration';
import { backgroundUrl } from './upload-background';

interface View {
  /** Camera centre, site metres, and scale in screen pixels per metre (canvas/store Camera). */
  camera: { x: number; y: number; pxPerM: number };
  viewport: { width: number; height: number };
}

interface Props extends View {
  sceneId: number;
  background: BackgroundPlacement;
}

function useHtmlImage(url: string): HTMLImageElement | null {
  const [img, setImg] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    const el = new window.Image();
    let live = true;
    el.onload = () => live && setImg(el);
    el.src = url;
    return () => {
      live = false;
    };
  }, [url]);
  return img;
}

/** The same mapping as canvas/editor/camera worldToScreen: site y is north, screen y is down. */
const toScreen = (v: View, p: { x: number; y: number }) => ({
  x: v.viewport.width / 2 + (p.x - v.camera.x) * v.camera.pxPerM,
  y: v.viewport.height / 2 - (p.y - v.camera.y) * v.camera.pxPerM,
});

/**
 * The site image, drawn under the plan at its calibrated scale. Put it in the lowest layer. It never takes
 * pointer events: the editor does its own hit-testing, and the image is moved from the panel.
 */
export function BackgroundImageNode({ sceneId, background, camera, viewport }: Props) {
  const img = useHtmlImage(backgroundUrl(sceneId, background.uploadId));
  if (!img) return null;
  const at = toScreen({ camera, viewport }, background);
  const scale = background.metresPerPixel * camera.pxPerM;
  return (
    <KonvaImage
      image={img}
      name="site-background"
      x={at.x}
      y={at.y}
      scaleX={scale}
      scaleY={scale}
      // Document rotation is counter-clockwise seen from above; Konva turns clockwise on screen.
      rotation={-background.rotation}
      opacity={background.opacity}
      listening={false}
    />
  );
}
