import { useId, type ComponentProps, type ReactNode } from 'react';
import { cx } from './cx';

export const controlClasses = (invalid: boolean) =>
  cx(
    'block w-full min-h-touch rounded-plate border-2 bg-paper-raised px-3.5 py-2 text-body text-ink placeholder:text-ink-muted/80',
    'focus:outline-none focus-visible:outline-[3px] focus-visible:outline-teal focus-visible:outline-offset-1',
    invalid ? 'border-over' : 'border-paper-edge hover:border-ink-soft',
  );

interface FieldFrameProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}

/** Label above, hint and error below. The error is text with a mark, so it reads without colour. */
export function FieldFrame({ id, label, hint, error, children, className }: FieldFrameProps) {
  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="text-label text-ink">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-caption text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="flex items-start gap-1.5 text-label font-semibold text-over">
          <span aria-hidden className="mt-0.5 inline-flex h-4 w-4 shrink-0 items-center justify-center rounded-full bg-over text-[11px] leading-none text-white">
            !
          </span>
          {error}
        </p>
      )}
    </div>
  );
}

export function describedBy(id: string, hint?: ReactNode, error?: string) {
  return error ? `${id}-error` : hint ? `${id}-hint` : undefined;
}

type TextFieldProps = Omit<ComponentProps<'input'>, 'id'> & { label: ReactNode; hint?: ReactNode; error?: string; id?: string; frameClassName?: string };

export function TextField({ label, hint, error, id, frameClassName, className, ...input }: TextFieldProps) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <FieldFrame id={fid} label={label} hint={hint} error={error} className={frameClassName}>
      <input id={fid} aria-invalid={error ? true : undefined} aria-describedby={describedBy(fid, hint, error)} className={cx(controlClasses(!!error), className)} {...input} />
    </FieldFrame>
  );
}
