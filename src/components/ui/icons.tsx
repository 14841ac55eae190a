import type { SVGProps } from 'react';

export type IconProps = SVGProps<SVGSVGElement>;

/**
 * The drawing rules of every icon (this file, action-icons.tsx, safety-icons.tsx, an area's own):
 * a 24-unit stroke drawing. Icons always sit next to a word, so they are hidden from assistive
 * technology.
 */
export function Icon({ children, className = 'size-6', ...props }: IconProps) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      className={`shrink-0 ${className}`}
      {...props}
    >
      {children}
    </svg>
  );
}

export const BoardIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3" y="3" width="8" height="10" rx="1.5" />
    <rect x="13" y="3" width="8" height="6" rx="1.5" />
    <rect x="13" y="11" width="8" height="10" rx="1.5" />
    <rect x="3" y="15" width="8" height="6" rx="1.5" />
  </Icon>
);

export const CalendarIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3" y="5" width="18" height="16" rx="2" />
    <path d="M3 10h18M8 3v4M16 3v4" />
  </Icon>
);

export const TeamIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="9" cy="8" r="3.5" />
    <path d="M2.5 20c.8-3.5 3.3-5.5 6.5-5.5s5.7 2 6.5 5.5" />
    <path d="M16 4.8a3.5 3.5 0 0 1 0 6.4M18 14.8c1.8.7 3 2.4 3.5 5.2" />
  </Icon>
);

export const SignOutIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M10 4H6a2 2 0 0 0-2 2v12a2 2 0 0 0 2 2h4" />
    <path d="M15 8l4 4-4 4M19 12H9" />
  </Icon>
);

export const CheckIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M4.5 12.5l5 5 10-11" />
  </Icon>
);

export const CurrentIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M5 21V4" />
    <path d="M5 4h12l-2.5 4L17 12H5" fill="currentColor" fillOpacity={0.25} />
  </Icon>
);

export const PinIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 21s-7-6.2-7-11.5a7 7 0 0 1 14 0C19 14.8 12 21 12 21z" />
    <circle cx="12" cy="9.5" r="2.5" />
  </Icon>
);

export const GlobeIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="12" r="9" />
    <path d="M3 12h18M12 3c2.5 2.7 3.8 5.7 3.8 9s-1.3 6.3-3.8 9c-2.5-2.7-3.8-5.7-3.8-9S9.5 5.7 12 3z" />
  </Icon>
);

export const RobotIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="4" y="7" width="16" height="11" rx="2.5" />
    <path d="M12 3v4M8.5 12h.01M15.5 12h.01M9 21h6M2 11v3M22 11v3" />
  </Icon>
);

export const AlertIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 3.5L2.5 20h19L12 3.5z" />
    <path d="M12 10v4.5M12 17.5h.01" />
  </Icon>
);

export const CopyIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="8" y="8" width="12" height="12" rx="2" />
    <path d="M16 8V6a2 2 0 0 0-2-2H6a2 2 0 0 0-2 2v8a2 2 0 0 0 2 2h2" />
  </Icon>
);

export const PlusIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 5v14M5 12h14" />
  </Icon>
);

export const PencilIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M4 20h4L19 9a2.8 2.8 0 0 0-4-4L4 16v4z" />
    <path d="M13.5 6.5l4 4" />
  </Icon>
);

export const PauseIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="12" r="9" />
    <path d="M10 9v6M14 9v6" />
  </Icon>
);

export const OfflineIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M3 3l18 18M8.5 16.5a5 5 0 0 1 7 0M5 12.9a10 10 0 0 1 4.2-2.4M19 12.9a10 10 0 0 0-2.5-1.7M2 9.3a14 14 0 0 1 4-2.6M22 9.3A14 14 0 0 0 10.7 5.6M12 20h.01" />
  </Icon>
);

export const UserIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="8" r="4" />
    <path d="M4 21c.9-4 4-6.5 8-6.5s7.1 2.5 8 6.5" />
  </Icon>
);

/** The schedule: a list of slots against a clock face, our own drawing. */
export const ScheduleIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M3 5h9M3 10h6M3 15h5M3 20h8" />
    <circle cx="17" cy="14" r="5" />
    <path d="M17 11.5V14l1.8 1.2" />
  </Icon>
);

export const ClockIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="12" r="9" />
    <path d="M12 7v5l3 2" />
  </Icon>
);

/** Queue call: a person walking toward a marker. */
export const QueueIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="9" cy="4.5" r="2" />
    <path d="M7 21l2-6 3 2v4M9 15l-1-5 4 1 2 3M8 10l-3 3" />
    <path d="M19 21V8M19 8h-3l1.5-2.5L16 3h3" />
  </Icon>
);

export const StarIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 3.5l2.6 5.3 5.9.9-4.3 4.1 1 5.8-5.2-2.7-5.2 2.7 1-5.8-4.3-4.1 5.9-.9L12 3.5z" fill="currentColor" fillOpacity={0.25} />
  </Icon>
);

/** The field has the match: a play triangle inside a rounded field outline. */
export const FieldIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="2.5" y="5" width="19" height="14" rx="3" />
    <path d="M10 9v6l5-3-5-3z" fill="currentColor" />
  </Icon>
);

export const UndoIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M9 14L4 9l5-5" />
    <path d="M4 9h10.5a5.5 5.5 0 0 1 0 11H11" />
  </Icon>
);

export const ChecksIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="4" y="3" width="16" height="18" rx="2" />
    <path d="M8 8.5l1.5 1.5 3-3M8 15.5l1.5 1.5 3-3M15 9h1.5M15 16h1.5" />
  </Icon>
);

export const GripIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M9 5h.01M15 5h.01M9 12h.01M15 12h.01M9 19h.01M15 19h.01" strokeWidth={3} />
  </Icon>
);

export const BatteryIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3" y="7" width="18" height="13" rx="2" />
    <path d="M7 7V4.5h3V7M14 7V4.5h3V7M6.5 13.5h4M15 11.5v4M13 13.5h4" />
  </Icon>
);

/** Repairs: an open-ended wrench. */
export const WrenchIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M14.5 6.5a4 4 0 0 0 5.3 4.9L20.5 11l-9.8 9.8a2.1 2.1 0 0 1-3-3L17.5 8l-.4-.7a4 4 0 0 0-4.9-5.3l2.6 2.6-.3 1.9z" />
  </Icon>
);

/** "More": three dots in a row. */
export const MoreIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M5 12h.01M12 12h.01M19 12h.01" strokeWidth={3.5} />
  </Icon>
);

/** A stop sign's octagon with a bar: blocks the match (a shape of its own, never colour alone). */
export const OctagonIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M8.2 2.8h7.6l5.4 5.4v7.6l-5.4 5.4H8.2l-5.4-5.4V8.2z" />
    <path d="M8 12h8" />
  </Icon>
);

/** Cosmetic: a hollow circle, the quietest shape. */
export const DotIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="12" r="5" />
  </Icon>
);

export const MailIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3" y="5" width="18" height="14" rx="2" />
    <path d="m3.5 6.5 8.5 6.5 8.5-6.5" />
  </Icon>
);
