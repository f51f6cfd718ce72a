export interface CsvFilePickerProps {
  /** Called with the chosen file's name and text. */
  onFile: (name: string, text: string) => void;
  testID?: string;
}

// Native apps have no file input here: the import screen's paste box is the way in.
// The web build uses csv-file-picker.web.tsx, a real <input type="file">.
/**
 * A button that chooses a .csv file and reads it as text (web only; renders nothing natively).
 * Example: `<CsvFilePicker onFile={(name, text) => setCsv(text)} />`
 */
export function CsvFilePicker(_props: CsvFilePickerProps) {
  return null;
}
