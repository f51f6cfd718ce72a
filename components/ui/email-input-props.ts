import type { TextInputProps } from 'react-native';

/**
 * The input settings every e-mail field shares: the e-mail keyboard, browser
 * autofill, and no capitalising or autocorrecting of the address.
 * Example: `<FormField control={control} name="email" label="E-mail" {...emailInputProps} />`
 */
export const emailInputProps = {
  autoComplete: 'email',
  keyboardType: 'email-address',
  inputMode: 'email',
  autoCapitalize: 'none',
  autoCorrect: false,
} as const satisfies TextInputProps;
