import { useRef, useState, type CSSProperties } from 'react';

import type { CsvFilePickerProps } from '@/components/import-export/csv-file-picker';
import { borders, colors, fonts, layout, radii, space } from '@/components/theme';

// On the web a file is chosen with a real <input type="file"> (a label styled as a
// button keeps it keyboard- and screen-reader-usable) and read with FileReader.
/**
 * A button that chooses a .csv file and reads it as text.
 * Example: `<CsvFilePicker onFile={(name, text) => setCsv(text)} />`
 */
export function CsvFilePicker({ onFile, testID }: CsvFilePickerProps) {
  const input = useRef<HTMLInputElement>(null);
  const [focused, setFocused] = useState(false);
  const label: CSSProperties = {
    display: 'inline-flex',
    alignItems: 'center',
    boxSizing: 'border-box',
    minHeight: layout.minTap,
    paddingLeft: space.xl - space.xs,
    paddingRight: space.xl - space.xs,
    borderRadius: radii.md,
    border: `${borders.control}px solid ${colors.lineStrong}`,
    backgroundColor: colors.surface,
    color: colors.ink,
    fontFamily: fonts.bold,
    fontSize: 16,
    cursor: 'pointer',
    outline: focused ? `${borders.focus}px solid ${colors.focus}` : 'none',
    outlineOffset: 2,
  };
  return (
    <label style={label}>
      Choose a CSV file
      <input
        ref={input}
        type="file"
        accept=".csv,text/csv,text/plain"
        data-testid={testID}
        style={{ position: 'absolute', width: 1, height: 1, opacity: 0 }}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onChange={(event) => {
          const file = event.target.files?.[0];
          if (!file) return;
          file.text().then((text) => onFile(file.name, text));
          event.target.value = '';
        }}
      />
    </label>
  );
}
