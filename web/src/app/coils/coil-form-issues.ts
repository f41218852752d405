import { coilSchema, type Coil } from '../../../../physics/src/index';
import type { CoilFormValue } from './coil-form';
import { coilIssueControl } from './coil-issue-control';
import { coilSpecFromForm } from './coil-spec-from-form';

/** One problem of the coil as the form shows it: at a control, or for the page when null. */
export interface CoilFormIssue {
  control: string | null;
  message: string;
  /** A required value is missing (shown once the user has been at the field). */
  missing: boolean;
}

export interface CoilFormCheck {
  /** The assembled spec, valid or not. */
  spec: Record<string, unknown>;
  /** The spec as the engine accepted it; null while there are issues. */
  coil: Coil | null;
  issues: CoilFormIssue[];
}

// The engine's message for a number that is not there ("expected a finite number, received
// nothing; allowed: …") is rewritten as the form's own "Required" with the same range.
const missingPrefix = /^expected a finite number, received nothing; /;

/**
 * Checks the editor's values with the physics engine's own schema: the range of every field and,
 * once those hold, the cross-field rules of `coilGeometryIssues` (pitch below the conductor width,
 * inner not below outer, layers closer than the conductor, a ferrite surface inside the winding).
 * Each issue is mapped to the form control that shows it.
 *
 * @param value the form's raw value
 * @returns the spec, the validated coil (or null), and the issues
 */
export function coilFormIssues(value: CoilFormValue): CoilFormCheck {
  const { spec, problems } = coilSpecFromForm(value);
  const issues: CoilFormIssue[] = problems.map((p) => ({ ...p, missing: false }));
  const result = coilSchema.safeParse(spec);
  if (result.success && issues.length === 0) return { spec, coil: result.data, issues };
  if (!result.success) {
    for (const issue of result.error.issues) {
      const missing = missingPrefix.test(issue.message);
      const control = coilIssueControl(value.kind, issue.path);
      const at = issue.path[0] === 'points' && typeof issue.path[1] === 'number';
      const where = at ? `Point ${Number(issue.path[1]) + 1}: ` : '';
      const message = missing
        ? `Required (${issue.message.replace(missingPrefix, '')})`
        : `${where}${issue.message}`;
      // The points field reports its own reading problem first; the engine's then add nothing.
      if (control === 'points' && problems.length > 0) continue;
      issues.push({ control, message: capitalise(message), missing });
    }
  }
  return { spec, coil: null, issues };
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
