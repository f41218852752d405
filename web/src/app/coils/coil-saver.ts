import { HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, catchError, map, of } from 'rxjs';
import type { Coil } from '../../../../physics/src/index';
import { apiProblem } from '../api-problem';
import type { CoilResponse, CreateCoilRequest, ProblemResponse } from '../api-types';
import type { CoilForm } from './coil-form';
import { coilIssueControl } from './coil-issue-control';
import { CoilsApi } from './coils-api';

export type SaveOutcome =
  | { kind: 'saved'; coil: CoilResponse }
  | { kind: 'stale'; currentVersion: number }
  | { kind: 'failed'; message: string };

export interface SaveRequest {
  workspaceId: string;
  form: CoilForm;
  /** The spec as the engine accepted it. */
  coil: Coil;
  /** The stored coil being edited; null for a new one. */
  existing: CoilResponse | null;
  /** The version to save over (the loaded one, or the current one to overwrite). */
  version?: number;
}

/**
 * Saves the editor's coil: POST for a new one, PUT with the loaded `version` otherwise. A stale
 * version comes back as `stale` with the version now stored; a problem with a field is put on
 * that field's control (the spec's paths mapped to the form's controls). Nothing in the form is
 * reset on failure.
 */
@Injectable()
export class CoilSaver {
  private readonly api = inject(CoilsApi);

  save(request: SaveRequest): Observable<SaveOutcome> {
    const value = request.form.getRawValue();
    const body: CreateCoilRequest = {
      name: value.name.trim(),
      description: value.description,
      spec: request.coil,
      operatingFrequencyHz: value.operatingFrequencyHz,
      ratedCurrentA: value.ratedCurrentA,
    };
    const existing = request.existing;
    const call = existing
      ? this.api.update(request.workspaceId, existing.id, {
          ...body,
          version: request.version ?? existing.version,
        })
      : this.api.create(request.workspaceId, body);
    return call.pipe(
      map((coil): SaveOutcome => ({ kind: 'saved', coil })),
      catchError((error: unknown) => of(this.failed(request, error))),
    );
  }

  private failed(request: SaveRequest, error: unknown): SaveOutcome {
    const problem = apiProblem(error);
    const body =
      error instanceof HttpErrorResponse ? (error.error as Partial<ProblemResponse> | null) : null;
    if (problem.code === 'stale_version') {
      const currentVersion = body?.currentVersion ?? (request.existing?.version ?? 0) + 1;
      return { kind: 'stale', currentVersion };
    }
    const control = problem.field ? this.controlOf(request, problem.field) : null;
    if (control) {
      control.setErrors({ ...(control.errors ?? {}), geometry: problem.message });
      control.markAsTouched();
    }
    return { kind: 'failed', message: `Not saved: ${problem.message}` };
  }

  /** `name`, `operatingFrequencyHz`, or a spec path such as `spec.conductor.diameter`. */
  private controlOf(request: SaveRequest, field: string) {
    const form = request.form;
    const [head, ...rest] = field.split('.');
    if (head !== 'spec') return form.get(head);
    const path = rest.map((part) => (/^\d+$/.test(part) ? Number(part) : part));
    const name = coilIssueControl(request.coil.kind, path);
    return name ? form.get(name) : null;
  }
}
