'use client';
import { useState } from 'react';
import { useEditorContext, useEditorState } from '../editor-context';
import type { PlaceKind } from '@/lib/scene/factories';
import { Icon } from './icons';

type ToolChoice = 'select' | 'hand' | 'tape' | PlaceKind;
interface RailItem {
  id: string;
  label: string;
  icon: string;
  key: string;
  tool?: ToolChoice;
  options?: { tool: PlaceKind; label: string }[];
  edit?: boolean;
}

const ITEMS: RailItem[] = [
  { id: 'select', label: 'Select', icon: 'select', key: 'V', tool: 'select' },
  { id: 'hand', label: 'Pan', icon: 'hand', key: 'H', tool: 'hand' },
  { id: 'truck', label: 'Truck', icon: 'truck', key: 'T', tool: 'truck', edit: true },
  {
    id: 'load',
    label: 'Load',
    icon: 'load',
    key: 'L',
    edit: true,
    options: [
      { tool: 'load-coil', label: 'Steel coil' },
      { tool: 'load-box', label: 'Box or crate' },
      { tool: 'load-vehicle', label: 'Vehicle' },
    ],
  },
  { id: 'trailer', label: 'Trailer', icon: 'trailer', key: 'R', tool: 'trailer', edit: true },
  {
    id: 'obstacle',
    label: 'Obstacle',
    icon: 'obstacle',
    key: 'O',
    edit: true,
    options: [
      { tool: 'obstacle-rect', label: 'Structure (rectangle)' },
      { tool: 'obstacle-circle', label: 'Structure (round)' },
      { tool: 'obstacle-polygon', label: 'Outline, corner by corner' },
      { tool: 'pole', label: 'Pole' },
      { tool: 'tree', label: 'Tree' },
      { tool: 'traffic-lane', label: 'Traffic lane' },
    ],
  },
  { id: 'power', label: 'Power line', icon: 'power', key: 'W', tool: 'power-line', edit: true },
  { id: 'note', label: 'Note', icon: 'note', key: 'N', tool: 'note', edit: true },
  { id: 'tape', label: 'Tape', icon: 'tape', key: 'M', tool: 'tape', edit: true },
];

/** The tools, down the left edge: one press picks a tool; Load and Obstacle open a short list. */
export function ToolRail() {
  const { editor } = useEditorContext();
  const toolPath = useEditorState((s) => s.toolPath);
  const placeKind = useEditorState((s) => s.placeKind);
  const readOnly = useEditorState((s) => s.readOnly);
  const [open, setOpen] = useState<string | null>(null);

  const isActive = (it: RailItem) => {
    if (it.id === 'select') return toolPath.startsWith('select');
    if (it.id === 'hand') return toolPath.startsWith('hand');
    if (it.id === 'tape') return toolPath.startsWith('tape');
    if (!toolPath.startsWith('place') || !placeKind) return false;
    return it.tool === placeKind || !!it.options?.some((o) => o.tool === placeKind);
  };

  return (
    <nav aria-label="Tools" className="relative z-20 flex w-[68px] shrink-0 flex-col gap-1 overflow-y-auto border-r border-paper-line bg-paper-raised p-1.5">
      {ITEMS.filter((it) => !readOnly || !it.edit).map((it) => (
        <div key={it.id} className="relative">
          <button
            type="button"
            title={`${it.label} (${it.key})`}
            aria-pressed={isActive(it)}
            aria-haspopup={it.options ? 'menu' : undefined}
            data-tool={it.id}
            onClick={() => {
              if (it.options) return setOpen(open === it.id ? null : it.id);
              setOpen(null);
              editor.setTool(it.tool!);
            }}
            className={`flex min-h-[52px] w-full flex-col items-center justify-center rounded-md border text-[11px] font-medium leading-tight ${
              isActive(it) ? 'border-teal bg-teal text-white' : 'border-transparent text-ink hover:bg-paper-sunk'
            }`}
          >
            <Icon name={it.icon} />
            <span className="mt-0.5">{it.label}</span>
          </button>
          {open === it.id && it.options && (
            <div role="menu" className="absolute left-full top-0 z-30 ml-2 w-56 rounded-md border border-paper-line bg-paper-raised p-1 shadow-lg">
              {it.options.map((o) => (
                <button
                  key={o.tool}
                  role="menuitem"
                  type="button"
                  data-tool={o.tool}
                  className="block min-h-11 w-full rounded px-3 text-left text-sm hover:bg-paper-sunk"
                  onClick={() => {
                    setOpen(null);
                    editor.setTool(o.tool);
                  }}
                >
                  {o.label}
                </button>
              ))}
            </div>
          )}
        </div>
      ))}
    </nav>
  );
}
