import { useWatch, type Control, type FieldValues } from "react-hook-form";

/**
 * Everything a react-hook-form form holds, as typed, re-rendering when any of it changes: for
 * what a form works out while it is typed (a preview, a notice, a default offered in a field).
 * A copy is taken so that a change deep in a list counts as a change.
 */
export function useFormValues<Values extends FieldValues, Transformed>(
  control: Control<Values, unknown, Transformed>,
): Values {
  return useWatch({ control, compute: (values: Values) => structuredClone(values) });
}
