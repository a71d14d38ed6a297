import { useId, type ComponentProps, type ReactNode } from 'react';
import { FieldFrame, controlClasses, describedBy } from './field';
import { cx } from './cx';

type SelectFieldProps = Omit<ComponentProps<'select'>, 'id'> & { label: ReactNode; hint?: ReactNode; error?: string; id?: string; frameClassName?: string };

const chevron =
  "bg-[url(\"data:image/svg+xml,%3Csvg xmlns='http://www.w3.org/2000/svg' viewBox='0 0 16 16'%3E%3Cpath d='M3 6l5 5 5-5' fill='none' stroke='%2315202B' stroke-width='2.2' stroke-linecap='round'/%3E%3C/svg%3E\")] bg-[length:18px] bg-[right_0.85rem_center] bg-no-repeat";

export function SelectField({ label, hint, error, id, frameClassName, className, children, ...select }: SelectFieldProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <FieldFrame id={fid} label={label} hint={hint} error={error} className={frameClassName}>
      <select
        id={fid}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fid, hint, error)}
        className={cx(controlClasses(!!error), 'appearance-none pr-10', chevron, className)}
        {...select}
      >
        {children}
      </select>
    </FieldFrame>
  );
}
