// Phones: the typed date only (a native picker would need a package we do not
// ship); the web build uses date-field.web.tsx, which adds the browser's picker.
export { TypedDateField as DateField } from '@/components/sight-ins/typed-date-field';
