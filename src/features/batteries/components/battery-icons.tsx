import { Icon, type IconProps } from '../../../components/ui/icons';

export const BoltIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M13 2.5L5 13.5h6l-1 8 8-11h-6l1-8z" />
  </Icon>
);

/** "Watch": an eye, a different shape from the check of "good" and the octagon of "replace". */
export const EyeIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M2 12s3.6-6.5 10-6.5S22 12 22 12s-3.6 6.5-10 6.5S2 12 2 12z" />
    <circle cx="12" cy="12" r="3" />
  </Icon>
);

/** "Replace": a stop sign's octagon with a cross. */
export const StopIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M8.2 2.8h7.6l5.4 5.4v7.6l-5.4 5.4H8.2l-5.4-5.4V8.2z" />
    <path d="M9 9l6 6M15 9l-6 6" />
  </Icon>
);

/** A battery with nothing left in it. */
export const EmptyIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="2.5" y="7" width="17" height="10" rx="2" />
    <path d="M22 10.5v3M6 10l4 4M10 10l-4 4" />
  </Icon>
);

export const RetiredIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3" y="4" width="18" height="5" rx="1.5" />
    <path d="M5 9v9.5A1.5 1.5 0 0 0 6.5 20h11a1.5 1.5 0 0 0 1.5-1.5V9M10 13h4" />
  </Icon>
);
