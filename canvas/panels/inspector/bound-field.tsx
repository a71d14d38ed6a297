'use client';
import { useEditorContext, useEditorState } from '../../editor-context';
import { SpecField } from '../fields';
import type { BoundField } from './bound-fields';

/** One of the inspector's document-bound fields: shows what the plan uses, commits through its command. */
export function Bound({ field, disabled, label }: { field: BoundField; disabled?: boolean; label?: string }) {
  const { store } = useEditorContext();
  const doc = useEditorState((s) => s.document);
  return (
    <SpecField
      label={label ?? field.label}
      value={field.read(doc)}
      spec={field.spec}
      testId={field.testId}
      disabled={disabled || field.inert?.(doc)}
      onCommit={(v) => store.getState().run(field.write(v))}
    />
  );
}
