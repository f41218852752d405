import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import type { CoilResponse } from '../api-types';
import { Icon } from '../shell/icon';
import { formatQuantity } from '../units/format-quantity';
import type { CoilRow } from './coil-rows';

/**
 * The coil library as a table. Row actions beyond opening (duplicate, delete) exist only when
 * `editable`: reviewers and viewers do not get them at all.
 */
@Component({
  selector: 'app-coils-table',
  imports: [
    DatePipe,
    Icon,
    MatButtonModule,
    MatMenuModule,
    MatSortModule,
    MatTableModule,
    MatTooltipModule,
    RouterLink,
  ],
  templateUrl: './coils-table.html',
  styleUrl: './coils-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilsTable {
  readonly rows = input.required<CoilRow[]>();
  readonly editable = input(false);
  readonly workspaceId = input.required<string>();
  /** Coils with an action on the wire; their menus wait. */
  readonly busy = input<ReadonlySet<string>>(new Set());
  readonly sortChange = output<Sort>();
  readonly duplicate = output<CoilResponse>();
  readonly remove = output<CoilResponse>();

  protected readonly columns = computed(() => [
    'name',
    'kind',
    'size',
    'turns',
    'conductor',
    'L',
    'Rac',
    'Q',
    'wireLength',
    'updated',
    'usedBy',
    ...(this.editable() ? ['actions'] : []),
  ]);

  protected readonly format = formatQuantity;

  protected frequency(coil: CoilResponse): string {
    return coil.operatingFrequencyHz === null
      ? ''
      : formatQuantity(coil.operatingFrequencyHz, 'Hz');
  }
}
