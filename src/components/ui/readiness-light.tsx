import type { SVGProps } from 'react';
import type { ReadinessJson, ReadinessState, ReasonLevel } from '@shared/domain/readiness';
import { AlertIcon, CheckIcon } from './icons';

/** Not ready: a stop sign's octagon with a cross, so the shape differs from "at risk" too. */
function StopIcon({ className = 'size-6', ...props }: SVGProps<SVGSVGElement>) {
  return (
    <svg viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" aria-hidden="true" focusable="false" className={`shrink-0 ${className}`} {...props}>
      <path d="M8.2 2.8h7.6l5.4 5.4v7.6l-5.4 5.4H8.2l-5.4-5.4V8.2z" />
      <path d="M9 9l6 6M15 9l-6 6" />
    </svg>
  );
}

const WORD: Record<ReadinessState, string> = { ready: 'Ready', at_risk: 'At risk', not_ready: 'Not ready' };
const ICON: Record<ReadinessState, typeof CheckIcon> = { ready: CheckIcon, at_risk: AlertIcon, not_ready: StopIcon };
const REASON_ICON: Record<ReasonLevel, typeof CheckIcon> = { not_ready: StopIcon, at_risk: AlertIcon };
const LEVEL_WORD: Record<ReasonLevel, string> = { not_ready: 'Blocks the match', at_risk: 'Risk' };

type Colours = Record<ReadinessState, { frame: string; badge: string; word: string }>;

// Tablets: the theme's tokens (light and dark). Loud only for "not ready", the state that needs
// someone to act before the robot may queue.
const PAGE: Colours = {
  ready: { frame: 'border-ok bg-ok-soft text-ink', badge: 'bg-ok text-surface', word: 'text-ok' },
  at_risk: { frame: 'border-warning bg-warning-soft text-ink', badge: 'bg-warning text-surface', word: 'text-warning' },
  not_ready: { frame: 'border-danger bg-danger text-on-danger', badge: 'bg-on-danger text-danger', word: '' },
};

// The pit screen is always dark (AAA), in the palette its other parts use: calm green when
// ready, the amber of "Tight" when at risk, the red of "Queue now" when not ready.
const SCREEN: Colours = {
  ready: { frame: 'border-emerald-300 bg-neutral-900 text-neutral-50', badge: 'bg-emerald-300 text-neutral-950', word: 'text-emerald-300' },
  at_risk: { frame: 'border-amber-300 bg-neutral-900 text-neutral-50', badge: 'bg-amber-300 text-neutral-950', word: 'text-amber-300' },
  not_ready: { frame: 'border-red-700 bg-red-700 text-white', badge: 'bg-white text-red-700', word: '' },
};

const LOOKS = {
  page: {
    colours: PAGE,
    frame: 'flex-col gap-3 rounded-2xl p-4',
    badge: 'size-12',
    icon: 'size-8',
    word: 'text-3xl',
    reasons: 'gap-1.5 text-lg',
    reasonIcon: 'mt-1 size-5',
  },
  // Read from across the pit; the word and the reasons side by side, so a 1080p TV keeps room
  // for the countdowns and the later matches.
  screen: {
    colours: SCREEN,
    frame: 'flex-row items-center gap-x-10 gap-y-4 rounded-3xl px-8 py-5',
    badge: 'size-20',
    icon: 'size-14',
    word: 'text-6xl whitespace-nowrap',
    reasons: 'min-w-0 flex-1 gap-2 text-3xl',
    reasonIcon: 'mt-1 size-8',
  },
} as const;

interface ReadinessLightProps {
  readiness: ReadinessJson;
  /** `screen`: the pit screen's dark, big version. */
  look?: keyof typeof LOOKS;
}

/**
 * Whether the robot is ready for a match: word + icon + colour (never colour alone), and the
 * reasons, worst first. Presentational: the board, the Checks page and the pit screen each fetch
 * the readiness their own way.
 */
export function ReadinessLight({ readiness, look = 'page' }: ReadinessLightProps) {
  const sizes = LOOKS[look];
  const colours = sizes.colours[readiness.state];
  const Icon = ICON[readiness.state];
  return (
    <section aria-label="Readiness" data-state={readiness.state} className={`flex border-2 ${colours.frame} ${sizes.frame}`}>
      <div role="status" className="flex shrink-0 items-center gap-3">
        <span className={`flex shrink-0 items-center justify-center rounded-full ${colours.badge} ${sizes.badge}`}>
          <Icon className={sizes.icon} strokeWidth={3} />
        </span>
        <p className={`min-w-0 leading-tight font-black tracking-wide uppercase ${colours.word} ${sizes.word}`}>{WORD[readiness.state]}</p>
      </div>
      {readiness.reasons.length > 0 && (
        <ul className={`flex flex-col ${sizes.reasons}`}>
          {readiness.reasons.map((reason) => {
            const ReasonIcon = REASON_ICON[reason.level];
            return (
              <li key={`${reason.code}:${reason.message}`} className="flex items-start gap-2">
                <ReasonIcon className={sizes.reasonIcon} />
                <span className="min-w-0">
                  <span className="sr-only">{LEVEL_WORD[reason.level]}: </span>
                  {reason.message}
                </span>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
