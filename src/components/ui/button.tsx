import { forwardRef, type ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';
const styles: Record<Variant, string> = {
  primary: 'bg-ink text-paper-card hover:bg-ink-soft disabled:bg-ink-faint',
  secondary: 'bg-paper-card text-ink border border-line-strong hover:bg-paper-deep',
  ghost: 'text-ink hover:bg-paper-deep',
  danger: 'bg-signal text-white hover:bg-signal-700',
};

/** A link (a download, another page) that looks like a secondary button, with the same touch target. */
export const linkButton =
  'inline-flex min-h-11 items-center justify-center rounded-lg border border-line-strong bg-paper-card px-4 font-bold text-ink hover:bg-paper-deep';

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  busy?: boolean;
  size?: 'md' | 'sm';
}

/** Large touch targets (44 px) for phones held in a floury hand. */
export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant = 'primary', busy, size = 'md', className = '', children, disabled, ...rest },
  ref,
) {
  const sizing = size === 'sm' ? 'min-h-9 px-3 text-sm' : 'min-h-11 px-4';
  return (
    <button
      ref={ref}
      className={`inline-flex items-center justify-center gap-2 rounded-lg font-bold transition-colors disabled:cursor-not-allowed ${sizing} ${styles[variant]} ${className}`}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy && <span className="h-4 w-4 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden />}
      {children}
    </button>
  );
});

/**
 * Edit and Delete for one item of a list of cards. The visible words stay short; the accessible names say which
 * item ("Edit Left oven"), as a page holds one pair per card.
 */
export function EditDeleteButtons({ name, onEdit, onDelete, className = 'flex gap-2' }: { name: string; onEdit: () => void; onDelete: () => void; className?: string }) {
  return (
    <div className={className}>
      <Button size="sm" variant="secondary" onClick={onEdit} aria-label={`Edit ${name}`}>
        Edit
      </Button>
      <Button size="sm" variant="ghost" onClick={onDelete} aria-label={`Delete ${name}`}>
        Delete
      </Button>
    </div>
  );
}
