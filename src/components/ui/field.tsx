import { forwardRef, useCallback, useEffect, useId, useRef, useState, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';
import { dayLabel } from '@/lib/dates';

interface FieldShellProps {
  label: string;
  error?: string;
  hint?: ReactNode;
  children: (ids: { id: string; describedBy?: string }) => ReactNode;
  className?: string;
}

/** A labelled control with its hint and its error, wired for screen readers. */
export function FieldShell({ label, error, hint, children, className = '' }: FieldShellProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errId = error ? `${id}-err` : undefined;
  const describedBy = [hintId, errId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-bold text-ink">
        {label}
      </label>
      {children({ id, describedBy })}
      {hint && (
        <p id={hintId} className="text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={errId} role="alert" className="flex items-start gap-1 text-sm font-bold text-signal">
          <span aria-hidden>⚠</span> {error}
        </p>
      )}
    </div>
  );
}

const control =
  'min-h-11 w-full rounded-lg border border-line-strong bg-paper-card px-3 py-2 text-ink placeholder:text-ink-faint aria-[invalid=true]:border-signal';

type InputProps = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: ReactNode };
export const TextField = forwardRef<HTMLInputElement, InputProps>(function TextField(
  { label, error, hint, className, ...rest },
  ref,
) {
  return (
    <FieldShell label={label} error={error} hint={hint} className={className}>
      {({ id, describedBy }) => (
        <input ref={ref} id={id} aria-describedby={describedBy} aria-invalid={!!error} className={control} {...rest} />
      )}
    </FieldShell>
  );
});

/**
 * A password box with a Show / Hide button beside the dots (NIST SP 800-63B §5.1.1.2: offer to display the secret
 * while it is typed, which phones need most). Shown, it is a text box without capitals, correction or spelling
 * marks; it goes back to dots when its form is sent, so a password manager still sees a password field.
 */
export const PasswordField = forwardRef<HTMLInputElement, Omit<InputProps, 'type'>>(function PasswordField(
  { label, error, hint, className, ...rest },
  ref,
) {
  const [shown, setShown] = useState(false);
  const own = useRef<HTMLInputElement | null>(null);
  const setRef = useCallback(
    (el: HTMLInputElement | null) => {
      own.current = el;
      if (typeof ref === 'function') ref(el);
      else if (ref) ref.current = el;
    },
    [ref],
  );
  useEffect(() => {
    const form = own.current?.form;
    if (!form || !shown) return;
    const hide = () => setShown(false);
    form.addEventListener('submit', hide);
    return () => form.removeEventListener('submit', hide);
  }, [shown]);
  return (
    <FieldShell label={label} error={error} hint={hint} className={className}>
      {({ id, describedBy }) => (
        <div className="relative">
          <input
            ref={setRef}
            id={id}
            aria-describedby={describedBy}
            aria-invalid={!!error}
            className={`${control} pr-20`}
            {...rest}
            type={shown ? 'text' : 'password'}
            autoCapitalize="none"
            autoCorrect="off"
            spellCheck={false}
          />
          <button
            type="button"
            aria-controls={id}
            onClick={() => setShown((v) => !v)}
            className="absolute inset-y-1 right-1 min-w-16 rounded-md px-3 text-sm font-bold text-ink underline underline-offset-2 hover:bg-paper-deep"
          >
            {shown ? 'Hide' : 'Show'} <span className="sr-only">password</span>
          </button>
        </div>
      )}
    </FieldShell>
  );
});

/** A checkbox with its words beside it and an optional hint under them (read out with the box). */
export const CheckField = forwardRef<HTMLInputElement, Omit<InputProps, 'type' | 'error'>>(function CheckField(
  { label, hint, className = '', ...rest },
  ref,
) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="flex min-h-11 items-center gap-2 font-bold text-ink">
        <input ref={ref} id={id} type="checkbox" aria-describedby={hintId} className="h-5 w-5 shrink-0 accent-herb" {...rest} />
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink-faint">
          {hint}
        </p>
      )}
    </div>
  );
});

type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string; hint?: ReactNode };
export const SelectField = forwardRef<HTMLSelectElement, SelectProps>(function SelectField(
  { label, error, hint, className, children, ...rest },
  ref,
) {
  return (
    <FieldShell label={label} error={error} hint={hint} className={className}>
      {({ id, describedBy }) => (
        <select ref={ref} id={id} aria-describedby={describedBy} aria-invalid={!!error} className={control} {...rest}>
          {children}
        </select>
      )}
    </FieldShell>
  );
});

type AreaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string; hint?: ReactNode };
export const TextAreaField = forwardRef<HTMLTextAreaElement, AreaProps>(function TextAreaField(
  { label, error, hint, className, ...rest },
  ref,
) {
  return (
    <FieldShell label={label} error={error} hint={hint} className={className}>
      {({ id, describedBy }) => (
        <textarea ref={ref} id={id} aria-describedby={describedBy} aria-invalid={!!error} className={control} {...rest} />
      )}
    </FieldShell>
  );
});

/** A select's options for calendar days: the ISO date as the value, the day in words as the text. */
export function DayOptions({ days }: { days: readonly string[] }) {
  return (
    <>
      {days.map((d) => (
        <option key={d} value={d}>
          {dayLabel(d, true)}
        </option>
      ))}
    </>
  );
}
