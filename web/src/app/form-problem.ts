import { FormGroup } from '@angular/forms';
import type { ApiProblem } from './api-problem';

/**
 * Shows a server problem where the user can act on it: on the form field it names (as a `server`
 * error that the field's `mat-error` prints), else it is returned for the page's banner.
 */
export function formProblem(
  form: FormGroup,
  problem: ApiProblem,
  fieldMessages: Partial<Record<string, Record<string, string>>> = {},
): string | null {
  const control = problem.field ? form.get(problem.field) : null;
  if (!control || !problem.field) return problem.message;
  const message = fieldMessages[problem.field]?.[problem.code] ?? problem.message;
  control.setErrors({ ...(control.errors ?? {}), server: message });
  control.markAsTouched();
  return null;
}
