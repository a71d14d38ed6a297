/** The exported plan drawing as plain data in paper points (y down): one model, drawn as PDF <Svg> and as SVG/PNG. */
export type DrawItem =
  | { t: 'poly'; pts: { x: number; y: number }[]; closed: boolean; stroke: string | null; fill: string | null; width: number; dash?: [number, number]; opacity?: number }
  | { t: 'circle'; x: number; y: number; r: number; stroke: string | null; fill: string | null; width: number }
  | { t: 'text'; x: number; y: number; text: string; size: number; colour: string; anchor: 'start' | 'middle' | 'end'; bold?: boolean };

export interface LegendEntry {
  label: string;
  stroke: string | null;
  fill: string | null;
  dash?: [number, number];
}

export interface PlanDrawing {
  /** Paper points. */
  width: number;
  height: number;
  /** "1:240 (1 in = 20 ft)". */
  scaleLabel: string;
  ratio: number;
  items: DrawItem[];
  legend: LegendEntry[];
  /** What each pad code on the drawing stands for ("Pads: FL left front · FJ front jack"). */
  padKey?: string;
}
