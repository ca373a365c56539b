// The quiet page around the sign-in and registration forms.
import type { ReactNode } from 'react';

export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <main className="flex min-h-full items-start justify-center px-4 py-12 sm:items-center">
      <div className="flex w-full max-w-sm flex-col gap-5">
        <div>
          <p className="font-serif text-3xl font-semibold tracking-tight text-clay-dark">Fieldshed</p>
          <p className="text-sm text-ink-soft">Keep the soil on the field: plan, treat and check, field by field.</p>
        </div>
        <section aria-labelledby="auth-title" className="flex flex-col gap-4 rounded-lg border border-paper-edge bg-white/50 p-5">
          <h1 id="auth-title" className="text-2xl font-semibold">
            {title}
          </h1>
          {children}
        </section>
      </div>
    </main>
  );
}
