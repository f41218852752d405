import { z } from 'zod';
import { defineRoute, type RouteDefinition } from '../http/route-definition';
import type { CapturedMailStore } from './fake-smtp-server';

export const listCapturedMailResponse = z.object({
  items: z.array(
    z.object({
      id: z.string(),
      to: z.string(),
      subject: z.string(),
      text: z.string(),
      html: z.string().nullable(),
      receivedAt: z.iso.datetime({ offset: true }),
    }),
  ),
});

/** Development and test only: the mail the local capture server received, newest first. */
export function devMailRoutes(store: CapturedMailStore | undefined): RouteDefinition[] {
  return [
    defineRoute({
      method: 'get',
      path: '/dev/mail',
      summary: 'Mail captured by the local SMTP server (not in production)',
      tag: 'development',
      access: 'public',
      success: { status: 200, description: 'Captured mail', schema: listCapturedMailResponse },
      handle: async () => ({
        items: (store?.newestFirst() ?? []).map((m) => ({
          id: m.id,
          to: m.to,
          subject: m.subject,
          text: m.text,
          html: m.html,
          receivedAt: m.receivedAt.toISOString(),
        })),
      }),
    }),
  ];
}
