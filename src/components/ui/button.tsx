// Buttons always carry text; `variant` picks filled accent, quiet outline or plain link look.
import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-clay text-paper hover:bg-clay-dark border border-clay-dark',
  secondary: 'bg-paper text-ink border border-ink-faint hover:bg-paper-deep',
  quiet: 'bg-transparent text-clay-dark underline-offset-2 hover:underline border border-transparent',
  danger: 'bg-paper text-alert border border-alert hover:bg-alert-light',
};

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; size?: 'sm' | 'md' };

export function Button({ variant = 'primary', size = 'md', className = '', type = 'button', ...rest }: ButtonProps) {
  const sizing = size === 'sm' ? 'px-2.5 py-1 text-sm' : 'px-4 py-2 text-base';
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-1.5 rounded-md font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${sizing} ${VARIANTS[variant]} ${className}`}
      {...rest}
    />
  );
}
