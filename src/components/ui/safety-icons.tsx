import { Icon, type IconProps } from './icons';

// The hazard shapes serve both the battery pages and the safety area.

/** Safety glasses. */
export const GogglesIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M2.5 9.5h19v4a3.5 3.5 0 0 1-3.5 3.5h-1.6a2.5 2.5 0 0 1-2.2-1.4L13 14a1.1 1.1 0 0 0-2 0l-1.2 1.6A2.5 2.5 0 0 1 7.6 17H6a3.5 3.5 0 0 1-3.5-3.5z" />
    <path d="M2.5 9.5L4 7h16l1.5 2.5" />
  </Icon>
);

/** Rinsing water. */
export const DropIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 3s6 6.5 6 11a6 6 0 0 1-12 0c0-4.5 6-11 6-11z" />
    <path d="M9.5 14.5a2.5 2.5 0 0 0 2.5 2.5" />
  </Icon>
);

/** Moving air: ventilate while charging. */
export const AirIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M3 8h11a2.5 2.5 0 1 0-2.5-2.5M3 12h16a2.5 2.5 0 1 1-2.5 2.5M3 16h8a2.5 2.5 0 1 1-2.5 2.5" />
  </Icon>
);

/** The safety area: a shield with a cross. */
export const ShieldIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 2.8l8 3v6c0 4.8-3.4 8.2-8 9.6-4.6-1.4-8-4.8-8-9.6v-6z" />
    <path d="M12 8.5v6M9 11.5h6" />
  </Icon>
);

/** First aid only: a plain cross in a square, a shape between the near miss's circle and the triangle. */
export const FirstAidIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3.5" y="3.5" width="17" height="17" rx="3" />
    <path d="M12 8v8M8 12h8" strokeWidth={2.5} />
  </Icon>
);
