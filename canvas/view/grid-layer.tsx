'use client';
import { memo } from 'react';
import { Layer, Shape } from 'react-konva';
import type { Camera } from '../store/types';
import { PAL } from './palette';
import { M_PER_FT, type UnitSystem } from '@/lib/units';

/** Grid spacing shown: the snapping grid, or a coarser round step when it would be under 10 px. */
export function visibleGridStep(grid: number, units: UnitSystem, pxPerM: number): number {
  const unit = units === 'metric' ? 1 : M_PER_FT;
  const ladder = [1, 5, 10, 50, 100, 500, 1000].map((n) => n * unit);
  if (grid * pxPerM >= 10) return grid;
  return ladder.find((s) => s >= grid && s * pxPerM >= 10) ?? ladder[ladder.length - 1];
}

/**
 * The plan grid, drawn in one canvas pass (cheaper than a node per line at any zoom). Memoised: a parent that
 * re-renders every frame (the replay) would otherwise hand Konva a new draw function and repaint the grid.
 */
export const GridLayer = memo(function GridLayer({ camera, viewport, grid, units }: { camera: Camera; viewport: { width: number; height: number }; grid: number; units: UnitSystem }) {
  const step = visibleGridStep(grid, units, camera.pxPerM);
  return (
    <Layer listening={false}>
      <Shape
        sceneFunc={(ctx) => {
          const { width, height } = viewport;
          const s = camera.pxPerM;
          const x0 = camera.x - width / 2 / s;
          const y1 = camera.y + height / 2 / s;
          const major = step * 5;
          const c = ctx._context;
          c.lineWidth = 1;
          for (const [spacing, colour] of [
            [step, PAL.grid],
            [major, PAL.gridMajor],
          ] as const) {
            c.strokeStyle = colour;
            c.beginPath();
            for (let gx = Math.ceil(x0 / spacing) * spacing; (gx - x0) * s <= width; gx += spacing) {
              const px = Math.round((gx - x0) * s) + 0.5;
              c.moveTo(px, 0);
              c.lineTo(px, height);
            }
            for (let gy = Math.floor(y1 / spacing) * spacing; (y1 - gy) * s <= height; gy -= spacing) {
              const py = Math.round((y1 - gy) * s) + 0.5;
              c.moveTo(0, py);
              c.lineTo(width, py);
            }
            c.stroke();
          }
        }}
      />
    </Layer>
  );
});
