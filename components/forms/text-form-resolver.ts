import { set, type FieldErrors, type FieldValues, type Resolver } from 'react-hook-form';
import type { ZodIssue, ZodType, ZodTypeDef } from 'zod';

import { messageForUnits, type FormUnits } from '@/components/forms/form-numbers';

export interface TextFormResolverOptions {
  /** Messages that name millimetres state inches instead (the archer types inches). */
  inches?: boolean;
  /** The archer's units: limits in messages are stated in them ("at least 19.69 in", "at most 122 °F"). */
  units?: FormUnits;
  /** Fields whose nested issues (e.g. pinDistances[2]) are shown on the field itself. */
  flatten?: readonly string[];
  /** Maps an issue's path in the API input to the form field it belongs to (default: the path joined with dots). */
  mapPath?: (path: readonly (string | number)[]) => string;
}

/** The form path an issue belongs to (its first issue per path wins). */
function pathOf(issue: ZodIssue, flatten: readonly string[], mapPath?: (path: readonly (string | number)[]) => string): string {
  if (mapPath) return mapPath(issue.path);
  const [head] = issue.path;
  if (typeof head === 'string' && flatten.includes(head)) return head;
  return issue.path.join('.');
}

/**
 * A react-hook-form resolver for forms that hold text: `schema` turns the text
 * into the API's input (numbers, millimetres) and pipes it through the shared
 * zod schema, so the form checks exactly what the server will. The first
 * message per field is shown under that field; on success the form's submit
 * handler receives the parsed API input.
 *
 * Example: `useForm({ resolver: textFormResolver<BowFormText, BowInput>(bowFormSchema('in'), { inches: true, flatten: ['pinDistances'] }) })`
 */
export function textFormResolver<TText extends FieldValues, TOut extends FieldValues>(
  // The schema's own input is plain strings; the form's text type (TText) narrows its choices.
  schema: ZodType<TOut, ZodTypeDef, unknown>,
  options: TextFormResolverOptions = {},
): Resolver<TText, unknown, TOut> {
  const flatten = options.flatten ?? [];
  return async (values) => {
    const result = await schema.safeParseAsync(values);
    if (result.success) return { values: result.data, errors: {} };
    const errors: FieldErrors<TText> = {};
    const seen = new Set<string>();
    for (const issue of result.error.issues) {
      const path = pathOf(issue, flatten, options.mapPath) || 'root';
      if (seen.has(path)) continue;
      seen.add(path);
      const message = options.units
        ? messageForUnits(issue.message, options.units)
        : options.inches
          ? messageForUnits(issue.message, 'in', ['length'])
          : issue.message;
      set(errors, path === 'root' ? 'root.form' : path, { type: issue.code, message });
    }
    return { values: {}, errors };
  };
}
