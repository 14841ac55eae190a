import type { Alliance } from '@shared/domain/timeline';
import { allianceWord } from '../../lib/match-labels';

const solid: Record<Alliance, string> = {
  red: 'bg-alliance-red text-on-alliance',
  blue: 'bg-alliance-blue text-on-alliance',
};

const soft: Record<Alliance, string> = {
  red: 'border-alliance-red bg-alliance-red-soft text-alliance-red-ink',
  blue: 'border-alliance-blue bg-alliance-blue-soft text-alliance-blue-ink',
};

/** A small alliance tag: the colour with its word, never the colour alone. */
export function AllianceTag({ alliance, className = '' }: { alliance: Alliance; className?: string }) {
  return (
    <span
      className={`inline-flex min-w-14 items-center justify-center rounded-lg px-2 py-0.5 text-sm font-extrabold tracking-wider ${solid[alliance]} ${className}`}
    >
      {allianceWord(alliance)}
    </span>
  );
}

/** Classes for a panel tinted with an alliance colour (a row of team numbers). */
export function allianceSoftClass(alliance: Alliance): string {
  return soft[alliance];
}

/** Classes for a solid alliance block (the next match card's big colour). */
export function allianceSolidClass(alliance: Alliance): string {
  return solid[alliance];
}
