import { DatePipe, TitleCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { MemberResponse, Role } from '../api-types';
import { roles } from '../api-types';
import { Icon } from '../shell/icon';

export interface RoleChange {
  member: MemberResponse;
  role: Role;
}

/**
 * The members of a workspace. Editing controls (role select, remove) exist only when `editable`:
 * for anyone but an owner they are not rendered at all, not merely disabled.
 */
@Component({
  selector: 'app-members-table',
  imports: [
    DatePipe,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatSelectModule,
    MatTableModule,
    MatTooltipModule,
    TitleCasePipe,
  ],
  templateUrl: './members-table.html',
  styleUrl: './members-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersTable {
  readonly members = input.required<MemberResponse[]>();
  readonly editable = input(false);
  readonly selfId = input<string | null>(null);
  /** Members with a change on the wire; their controls wait. */
  readonly busy = input<ReadonlySet<string>>(new Set());
  readonly roleChange = output<RoleChange>();
  readonly remove = output<MemberResponse>();

  protected readonly roles = roles;
  protected readonly columns = computed(() =>
    this.editable()
      ? ['name', 'email', 'role', 'joined', 'actions']
      : ['name', 'email', 'role', 'joined'],
  );
  protected readonly rows = computed(() =>
    [...this.members()].sort(
      (a, b) =>
        roles.indexOf(a.role) - roles.indexOf(b.role) || a.displayName.localeCompare(b.displayName),
    ),
  );
}
