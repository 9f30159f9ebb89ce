import { MemberIdParams, MemberResponse, MemberRoleRequest, MembersResponse } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { requireAdminSession } from '../auth/admin-session';
import { connectOrUnavailable } from '../db/connect-or-unavailable';
import { HttpError } from '../http/errors';
import { parseBody, parseParams } from '../http/validate';
import { documentRoute } from '../openapi/route-docs';
import { changeMemberRole, LastAdminError, listMembers, memberRowView, UnknownMemberError } from '../services/members';

/** Members and their roles; a signed-in admin only. */
export function usersRouter(ctx: AppContext): Router {
  const router = Router();

  documentRoute({ method: 'get', path: '/api/v1/users', tag: 'members', summary: 'Every member with role and e-mail (signed-in admin)', needs: 'admin', response: MembersResponse });
  router.get('/users', requireAdminSession, async (_req, res) => {
    const users = await listMembers(await connectOrUnavailable(ctx.db));
    const body: MembersResponse = { users: users.map(memberRowView) };
    res.json(body);
  });

  documentRoute({
    method: 'patch',
    path: '/api/v1/users/:id',
    tag: 'members',
    summary: "Change a member's role; the last admin cannot be demoted (409)",
    needs: 'admin',
    params: MemberIdParams,
    body: MemberRoleRequest,
    response: MemberResponse,
  });
  router.patch('/users/:id', requireAdminSession, async (req, res) => {
    const { id } = parseParams(MemberIdParams, req);
    const { role } = parseBody(MemberRoleRequest, req);
    try {
      const user = await changeMemberRole(await connectOrUnavailable(ctx.db), id, role);
      const body: MemberResponse = { user: memberRowView(user) };
      res.json(body);
    } catch (err) {
      if (err instanceof UnknownMemberError) throw new HttpError(404, 'not_found', err.message);
      if (err instanceof LastAdminError) throw new HttpError(409, 'last_admin', err.message);
      throw err;
    }
  });

  return router;
}
