'use client';
import { useEditorContext, useEditorState } from '../../editor-context';
import { SpecField } from '../fields';
import type { BoundField } from './bound-fields';

/** One of the inspector's document-bound fields: shows what the plan uses, commits through its command. */
export function Bound({ field, disabled, label }: { field: BoundField; disabled?: boolean; label?: string }) {
  const { store } = useEditorContext();
  // The figure and whether it applies, not the document: a field re-renders when its own value changes.
  const value = useEditorState((s) => field.read(s.document));
  const inert = useEditorState((s) => field.inert?.(s.document) ?? false);
  return (
    <SpecField
      label={label ?? field.label}
      value={value}
      spec={field.spec}
      testId={field.testId}
      disabled={disabled || inert}
      onCommit={(v) => store.getState().run(field.write(v))}
    />
  );
}
