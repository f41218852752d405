import type { ValidationErrors } from '@angular/forms';

/**
 * The message a field shows for the errors a form put on its control: a text error (a cross-field
 * rule, a server message) as it is, Angular's own validators in words.
 *
 * @param errors the control's errors, without the field's own
 * @returns the first message, or null when there is none
 */
export function fieldErrorMessage(errors: ValidationErrors | null): string | null {
  if (!errors) return null;
  for (const [key, detail] of Object.entries(errors)) {
    if (typeof detail === 'string') return detail;
    if (key === 'required') return 'Required';
    if (key === 'min') return `Must be at least ${(detail as { min: number }).min}`;
    if (key === 'max') return `Must be at most ${(detail as { max: number }).max}`;
  }
  return 'Not allowed here';
}
