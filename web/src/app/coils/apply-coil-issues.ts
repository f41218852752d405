import type { AbstractControl } from '@angular/forms';
import type { CoilForm } from './coil-form';
import type { CoilFormIssue } from './coil-form-issues';

/** Controls that cannot print an error of their own: their issues go to the page. */
const silentControls = new Set(['hasBacking', 'conductorType', 'spiralModel', 'solenoidModel']);
/** The error keys this module owns on a control (the field's own validators keep theirs). */
const keys = ['geometry', 'required'] as const;

/**
 * Puts the engine's issues on the form controls they belong to (as `geometry` errors, or
 * `required` for a missing value), clears those of the previous check, and returns the issues
 * that no field can show, for the page. Only status events are emitted, so the form's
 * valueChanges (which started the check) do not fire again.
 *
 * @param form the editor's form
 * @param issues the issues of the latest check
 * @param previous controls flagged by the previous call (updated in place)
 * @returns the issues for the page
 */
export function applyCoilIssues(
  form: CoilForm,
  issues: CoilFormIssue[],
  previous: Set<AbstractControl>,
): CoilFormIssue[] {
  for (const control of previous) {
    const rest = { ...(control.errors ?? {}) };
    for (const key of keys) delete rest[key];
    control.setErrors(Object.keys(rest).length ? rest : null);
  }
  previous.clear();
  const unplaced: CoilFormIssue[] = [];
  for (const issue of issues) {
    const control =
      issue.control && !silentControls.has(issue.control) ? form.get(issue.control) : null;
    if (!control) {
      unplaced.push(issue);
      continue;
    }
    const key = issue.missing ? 'required' : 'geometry';
    // The first issue of a control is the one to fix first; later ones often follow from it.
    if (control.errors?.[key]) continue;
    control.setErrors({ ...(control.errors ?? {}), [key]: issue.message });
    previous.add(control);
  }
  return unplaced;
}
