/**
 * Printing the field card at its true size. Native apps have no print dialog
 * here, so this renders nothing; card-print.web.tsx has the web version (the
 * PDF download prints at actual size from any viewer).
 */
export interface CardPrintProps {
  /** The card SVG (100 × 150 mm). */
  svg: string;
  testID?: string;
}

export function CardPrint(_props: CardPrintProps) {
  return null;
}
