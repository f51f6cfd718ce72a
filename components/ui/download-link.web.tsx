import { useState, type CSSProperties } from 'react';

import { useOnline } from '@/components/offline/use-online';
import type { DownloadLinkProps } from '@/components/ui/download-link';
import { borders, colors, fonts, layout, radii, space } from '@/components/theme';

// On the web a download must be a real <a href download>: a script-opened address
// would navigate away from the app (the API sends the file as an attachment).
/**
 * A secondary-looking link that downloads a file (same props as download-link.tsx).
 * Example: `<DownloadLink label="Download SVG" href="/api/sight-ins/4/tape.svg" fileName="tape.svg" />`
 */
export function DownloadLink({ label, href, fileName, testID }: DownloadLinkProps) {
  const online = useOnline();
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
  // Every file comes from the server (PDF, SVG, CSV, JSON): with no signal say so
  // beside a disabled button instead of offering a link that fails.
  if (!online) {
    return (
      <span style={{ display: 'inline-flex', alignItems: 'center', flexWrap: 'wrap', gap: space.sm }}>
        <button
          type="button"
          disabled
          aria-describedby={testID ? `${testID}-offline` : undefined}
          data-testid={testID}
          style={{ ...style, opacity: 0.6, cursor: 'not-allowed' }}
        >
          {label}
        </button>
        <span id={testID ? `${testID}-offline` : undefined} style={{ color: colors.inkSoft, fontFamily: fonts.body, fontSize: 15 }}>
          Needs a connection
        </span>
      </span>
    );
  }
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
