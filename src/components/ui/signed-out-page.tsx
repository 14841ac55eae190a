import type { ReactNode } from 'react';
import { Wordmark } from './wordmark';

/** The panel of a page reached without a session (sign-in, a forgotten password, a link from an e-mail). */
export const signedOutPanelClass = 'flex w-full max-w-md flex-col gap-5 rounded-2xl border border-line bg-surface p-6 shadow-sm sm:p-8';

/** The frame of those pages: no navigation, the product's name, one panel in the middle. */
export function SignedOutPage({ children }: { children: ReactNode }) {
  return (
    <main className="flex min-h-dvh flex-col items-center justify-center gap-8 px-4 py-10">
      <div className="text-center">
        <Wordmark size="lg" />
        <p className="mt-3 text-lg text-ink-muted">One calm board for a loud pit.</p>
      </div>
      {children}
    </main>
  );
}
