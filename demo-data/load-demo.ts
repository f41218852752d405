import { and, eq, sql } from 'drizzle-orm';
import type { Database } from '../api/src/db/database';
import { hashPassword, verifyPassword } from '../api/src/auth/password-hasher';
import type { Role } from '../api/src/workspaces/workspaces-dto';
import { auditEvents, memberships, users, workspaces } from '../schema/src/index';
import { loadDemoLibrary } from './load-demo-library';
import { demoPassword, demoPeople, demoWorkspace } from './demo-workspace';

export interface DemoSignIn {
  email: string;
  password: string;
  role: Role;
  displayName: string;
  /** True when someone changed this account's password after the demo was loaded. */
  passwordChanged: boolean;
}

/**
 * Loads the demo workspace, its coil library and the baseline study with stored sweeps and a
 * revision (load-demo-library.ts). Idempotent: a second run adds nothing, and it never overwrites
 * what people changed since (passwords, names, roles, coils, studies). Returns the sign-ins to
 * print.
 */
export async function loadDemo(db: Database): Promise<DemoSignIn[]> {
  const signIns: DemoSignIn[] = [];
  await db.transaction(async (tx) => {
    // Two start-ups at once must not race each other into duplicate demo rows.
    await tx.execute(sql`SELECT pg_advisory_xact_lock(4300730002)`);
    const owner = demoPeople.find((p) => p.role === 'owner')!;
    const userIds = new Map<string, string>();
    for (const person of demoPeople) {
      const existing = await tx
        .select({ id: users.id, passwordHash: users.passwordHash })
        .from(users)
        .where(sql`lower(${users.email}) = ${person.email}`)
        .limit(1);
      let row = existing[0];
      if (!row) {
        const inserted = await tx
          .insert(users)
          .values({
            email: person.email,
            displayName: person.displayName,
            passwordHash: await hashPassword(demoPassword),
          })
          .returning({ id: users.id, passwordHash: users.passwordHash });
        row = inserted[0]!;
      }
      userIds.set(person.email, row.id);
      signIns.push({
        email: person.email,
        password: demoPassword,
        role: person.role,
        displayName: person.displayName,
        passwordChanged: !(await verifyPassword(row.passwordHash, demoPassword)),
      });
    }

    const created = await tx
      .insert(workspaces)
      .values({
        id: demoWorkspace.id,
        name: demoWorkspace.name,
        createdBy: userIds.get(owner.email)!,
      })
      .onConflictDoNothing()
      .returning({ id: workspaces.id });
    if (created.length === 1) {
      await tx.insert(auditEvents).values({
        workspaceId: demoWorkspace.id,
        actorId: userIds.get(owner.email)!,
        action: 'workspace.created',
        subject: demoWorkspace.name,
        details: { demo: true },
      });
    }
    for (const person of demoPeople) {
      const userId = userIds.get(person.email)!;
      // Only on the first load: a member who was removed or re-roled later stays that way.
      if (created.length === 1) {
        await tx
          .insert(memberships)
          .values({ workspaceId: demoWorkspace.id, userId, role: person.role })
          .onConflictDoNothing();
      }
      const member = await tx
        .select({ role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.workspaceId, demoWorkspace.id), eq(memberships.userId, userId)))
        .limit(1);
      const sign = signIns.find((s) => s.email === person.email)!;
      if (member[0]) sign.role = member[0].role;
    }
    // The editor, Oskar Brandt, built the library and ran the sweeps in the demo's story.
    const editor = demoPeople.find((p) => p.role === 'editor')!;
    await loadDemoLibrary(tx, { id: userIds.get(editor.email)!, displayName: editor.displayName });
  });
  return signIns;
}
