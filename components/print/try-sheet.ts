/** Where the try-it page leaves the sheet request for the print page (this tab only). */
export const TRY_SHEET_STORAGE_KEY = 'pinwright.try.sheet';
