/**
 * Props that mark a view for the print stylesheet of print-support.web.tsx
 * (react-native-web renders `dataSet` as data-* attributes; native ignores it).
 * Example: `<View {...hideInPrint}><Button … /></View>`
 */
export const hideInPrint = { dataSet: { print: 'hide' } } as object;
/** A card kept whole on paper, on a white ground. */
export const cardInPrint = { dataSet: { print: 'card' } } as object;
