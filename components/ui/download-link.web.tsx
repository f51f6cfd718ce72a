import { useState, type CSSProperties } from 'react';

import type { DownloadLinkProps } from '@/components/ui/download-link';
import { borders, colors, fonts, layout, radii, space } from '@/components/theme';

// On the web a download must be a real <a href download>: a script-opened address
// would navigate away from the app (the API sends the file as an attachment).
/**
 * A secondary-looking link that downloads a file (same props as download-link.tsx).
 * Example: `<DownloadLink label="Download SVG" href="/api/sessions/4/tape.svg" fileName="tape.svg" />`
 */
export function DownloadLink({ label, href, fileName, testID }: DownloadLinkProps) {
  const [hovered, setHovered] = useState(false);
  const [focused, setFocused] = useState(false);
  const style: CSSProperties = {
    display: 'inline-flex',
    alignItems: 'center',
    justifyContent: 'center',
    boxSizing: 'border-box',
    minHeight: layout.minTap,
    paddingLeft: space.xl - space.xs,
    paddingRight: space.xl - space.xs,
    borderRadius: radii.md,
    border: `${borders.control}px solid ${colors.lineStrong}`,
    backgroundColor: hovered ? colors.sunken : colors.surface,
    color: colors.ink,
    fontFamily: fonts.bold,
    fontSize: 16,
    lineHeight: '22px',
    textDecoration: 'none',
    outline: focused ? `${borders.focus}px solid ${colors.focus}` : 'none',
    outlineOffset: 2,
  };
  return (
    <a
      href={href}
      download={fileName ?? true}
      data-testid={testID}
      style={style}
      onMouseEnter={() => setHovered(true)}
      onMouseLeave={() => setHovered(false)}
      onFocus={() => setFocused(true)}
      onBlur={() => setFocused(false)}
    >
      {label}
    </a>
  );
}
