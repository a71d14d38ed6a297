import { useId, type ComponentProps, type ReactNode } from 'react';
import { FieldFrame, controlClasses, describedBy } from './field';
import { cx } from './cx';

type SelectFieldProps = Omit<ComponentProps<'select'>, 'id'> & { label: ReactNode; hint?: ReactNode; error?: string; id?: string; frameClassName?: string };

// The chevron comes from app/globals.css, which draws it on every single-choice select in the app.
export function SelectField({ label, hint, error, id, frameClassName, className, children, ...select }: SelectFieldProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <FieldFrame id={fid} label={label} hint={hint} error={error} className={frameClassName}>
      <select
        id={fid}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fid, hint, error)}
        className={cx(controlClasses(!!error), 'pr-10', className)}
        {...select}
      >
        {children}
      </select>
    </FieldFrame>
  );
}
