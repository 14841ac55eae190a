import { Icon, type IconProps } from './icons';

/** A charger: a plug with its lead. */
export const PlugIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M9 3v5M15 3v5M6 8h12v3a6 6 0 0 1-12 0V8zM12 17v4" />
  </Icon>
);

export const PrintIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M7 9V3h10v6M7 17H5a2 2 0 0 1-2-2v-4a2 2 0 0 1 2-2h14a2 2 0 0 1 2 2v4a2 2 0 0 1-2 2h-2" />
    <rect x="7" y="14" width="10" height="7" rx="1" />
  </Icon>
);

/** Into the robot: an arrow down into a tray. */
export const InstallIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 3v11M7 9l5 5 5-5M4 17v3h16v-3" />
  </Icon>
);

/** Out of the robot (or off a charger): an arrow up out of a tray. */
export const TakeOutIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M12 14V3M7 8l5-5 5 5M4 17v3h16v-3" />
  </Icon>
);

export const CameraIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M4 7h3l2-3h6l2 3h3a1 1 0 0 1 1 1v11a1 1 0 0 1-1 1H4a1 1 0 0 1-1-1V8a1 1 0 0 1 1-1z" />
    <circle cx="12" cy="13" r="4" />
  </Icon>
);

/** A photo that has no preview: a picture frame with a mountain. */
export const PhotoIcon = (p: IconProps) => (
  <Icon {...p}>
    <rect x="3" y="4" width="18" height="16" rx="2" />
    <circle cx="9" cy="9.5" r="1.5" />
    <path d="M3 17l5-5 4 4 3-3 6 6" />
  </Icon>
);

export const TrashIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M4 7h16M10 11v6M14 11v6M6 7l1 13h10l1-13M9 7V4h6v3" />
  </Icon>
);

/** Into the next column: an arrow to the right. */
export const ArrowRightIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M4 12h15M13 6l6 6-6 6" />
  </Icon>
);
