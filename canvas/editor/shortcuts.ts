import type { KeyInfo } from '../tools/tool-state';
import type { Editor } from './editor';
import { copySelection, deleteSelection, duplicate, fitToScene, nudgeSlew, paste, selectAll, toggleLock, zoomBy } from './actions';

export interface Shortcut {
  /** As shown in the help sheet. */
  keys: string;
  does: string;
  group: 'Tools' | 'Edit' | 'View' | 'Swing';
  match(e: KeyInfo): boolean;
  run(ed: Editor): void;
}

const key = (k: string, opts: { mod?: boolean; shift?: boolean } = {}) => (e: KeyInfo) =>
  e.key.toLowerCase() === k.toLowerCase() && e.mod === (opts.mod ?? false) && (opts.shift === undefined || e.shift === opts.shift);

/** Every keyboard shortcut, in the order the help sheet lists them. */
export const SHORTCUTS: Shortcut[] = [
  { keys: 'V', does: 'Select and move', group: 'Tools', match: key('v'), run: (ed) => ed.setTool('select') },
  { keys: 'H', does: 'Hand: drag to pan', group: 'Tools', match: key('h'), run: (ed) => ed.setTool('hand') },
  { keys: 'T', does: 'Place the truck', group: 'Tools', match: key('t'), run: (ed) => ed.setTool('truck') },
  { keys: 'L', does: 'Place a load (steel coil)', group: 'Tools', match: key('l'), run: (ed) => ed.setTool('load-coil') },
  { keys: 'R', does: 'Place a receiving trailer', group: 'Tools', match: key('r'), run: (ed) => ed.setTool('trailer') },
  { keys: 'O', does: 'Place an obstacle (rectangle)', group: 'Tools', match: key('o'), run: (ed) => ed.setTool('obstacle-rect') },
  { keys: 'P', does: 'Draw an obstacle outline', group: 'Tools', match: key('p'), run: (ed) => ed.setTool('obstacle-polygon') },
  { keys: 'W', does: 'Place a power line', group: 'Tools', match: key('w'), run: (ed) => ed.setTool('power-line') },
  { keys: 'N', does: 'Place a note', group: 'Tools', match: key('n'), run: (ed) => ed.setTool('note') },
  { keys: 'M', does: 'Measuring tape', group: 'Tools', match: key('m'), run: (ed) => ed.setTool('tape') },
  { keys: 'Ctrl Z', does: 'Undo', group: 'Edit', match: key('z', { mod: true, shift: false }), run: (ed) => ed.state.undo() },
  { keys: 'Ctrl Shift Z / Ctrl Y', does: 'Redo', group: 'Edit', match: (e) => key('z', { mod: true, shift: true })(e) || key('y', { mod: true })(e), run: (ed) => ed.state.redo() },
  { keys: 'Ctrl C', does: 'Copy', group: 'Edit', match: key('c', { mod: true }), run: copySelection },
  { keys: 'Ctrl V', does: 'Paste', group: 'Edit', match: key('v', { mod: true }), run: paste },
  { keys: 'Ctrl D', does: 'Duplicate', group: 'Edit', match: key('d', { mod: true }), run: duplicate },
  { keys: 'Ctrl A', does: 'Select everything', group: 'Edit', match: key('a', { mod: true }), run: selectAll },
  { keys: 'Ctrl L', does: 'Lock or unlock the selection', group: 'Edit', match: key('l', { mod: true }), run: toggleLock },
  { keys: 'Delete / Backspace', does: 'Delete the selection (locked objects stay)', group: 'Edit', match: (e) => !e.mod && (e.key === 'Delete' || e.key === 'Backspace'), run: deleteSelection },
  { keys: 'G', does: 'Snap to grid on or off', group: 'Edit', match: key('g'), run: (ed) => ed.set({ snapToGrid: !ed.state.snapToGrid }) },
  { keys: 'Shift (while turning)', does: 'Turn freely, without angle steps', group: 'Edit', match: () => false, run: () => {} },
  { keys: 'Alt (while moving)', does: 'Move freely, off the grid', group: 'Edit', match: () => false, run: () => {} },
  { keys: '← / →', does: 'Slew the boom 1° (Shift: 10°)', group: 'Swing', match: (e) => !e.mod && (e.key === 'ArrowLeft' || e.key === 'ArrowRight'), run: () => {} },
  { keys: 'F', does: 'Fit the scene in view', group: 'View', match: key('f'), run: fitToScene },
  { keys: '+ / −', does: 'Zoom in or out', group: 'View', match: (e) => !e.mod && ['+', '=', '-', '_'].includes(e.key), run: () => {} },
  { keys: 'Space + drag', does: 'Pan', group: 'View', match: () => false, run: () => {} },
  { keys: '?', does: 'Show or hide this sheet', group: 'View', match: (e) => e.key === '?', run: (ed) => ed.set({ helpOpen: !ed.state.helpOpen }) },
];

/** Handles a key through the shortcut table; true when one ran. */
export function runShortcut(ed: Editor, e: KeyInfo): boolean {
  if (e.key === 'ArrowLeft' || e.key === 'ArrowRight') {
    if (e.mod) return false;
    // Seen from above, counter-clockwise is to the left.
    nudgeSlew(ed, (e.key === 'ArrowLeft' ? 1 : -1) * (e.shift ? 10 : 1));
    return true;
  }
  if (!e.mod && ['+', '='].includes(e.key)) return zoomBy(ed, 1.25), true;
  if (!e.mod && ['-', '_'].includes(e.key)) return zoomBy(ed, 0.8), true;
  if (e.key === 'Escape') {
    ed.cancel();
    if (ed.path !== 'select.idle') ed.transition('select.idle');
    return true;
  }
  const s = SHORTCUTS.find((sc) => sc.match(e));
  if (!s) return false;
  s.run(ed);
  return true;
}
