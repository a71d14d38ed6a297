import type { ToolState } from './tool-state';
import { selectIdle } from './select/idle';
import { selectPointing } from './select/pointing';
import { selectDragging } from './select/dragging';
import { selectRotating } from './select/rotating';
import { selectBrushing } from './select/brushing';
import { selectSlewing } from './select/slewing';
import { selectExtending } from './select/extending';
import { handIdle } from './hand/idle';
import { handPanning } from './hand/panning';
import { placeIdle } from './place/idle';
import { placePolygon } from './place/polygon';
import { tapeIdle } from './tape/idle';
import { tapeStretching } from './tape/stretching';

export const TOOL_STATES: ToolState[] = [
  selectIdle,
  selectPointing,
  selectDragging,
  selectRotating,
  selectBrushing,
  selectSlewing,
  selectExtending,
  handIdle,
  handPanning,
  placeIdle,
  placePolygon,
  tapeIdle,
  tapeStretching,
];
