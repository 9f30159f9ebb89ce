import { z } from 'zod';
import { ApiScope, Role } from './access';

/** The header a cookie-authenticated write carries, holding `csrfToken` of GET /api/v1/me. */
export const CSRF_HEADER_NAME = 'X-CSRF-Token';

/** A path on this site (`/runs/…`): never `//host` or a full URL, so a sign-in cannot send anyone elsewhere. */
export const SameSitePath = z
  .string()
  .max(2000)
  .refine((p) => p.startsWith('/') && !p.startsWith('//') && !p.startsWith('/\\') && !/[\u0000-\u001f\\]/.test(p), {
    message: 'must be a path on this site, starting with a single /',
  });

/** GET /api/v1/auth/github?next=/path */
export const SignInStartQuery = z.object({ next: SameSitePath.optional() });
export type SignInStartQuery = z.infer<typeof SignInStartQuery>;

/** GET /api/v1/auth/github/callback: what the provider sends back (a code and the state, or an error). */
export const SignInCallbackQuery = z.object({
  code: z.string().max(512).optional(),
  state: z.string().max(512).optional(),
  error: z.string().max(200).optional(),
  error_description: z.string().max(2000).optional(),
});
export type SignInCallbackQuery = z.infer<typeof SignInCallbackQuery>;

/** The signed-in member as they see themselves. */
export const SignedInMember = z.object({
  id: z.uuid(),
  login: z.string(),
  displayName: z.string().nullable(),
  email: z.string().nullable(),
  role: Role,
  notifyOnFinish: z.boolean(),
});
export type SignedInMember = z.infer<typeof SignedInMember>;

/** Every permission a caller can hold: the API key scopes and `admin`. */
export const ApiPermission = z.enum([...ApiScope.options, 'admin']);
export type ApiPermission = z.infer<typeof ApiPermission>;

/** GET /api/v1/me: who is calling, how, what they may do, and how to sign in. */
export const MeResponse = z.object({
  user: SignedInMember.nullable(),
  via: z.enum(['session', 'key']).nullable(),
  permissions: z.array(ApiPermission),
  /** Echo it in X-CSRF-Token on every write made with the session cookie; null without a session. */
  csrfToken: z.string().nullable(),
  /** Which provider sign-in goes through; null when sign-in is not configured. */
  signIn: z.object({ provider: z.enum(['github', 'local']) }).nullable(),
});
export type MeResponse = z.infer<typeof MeResponse>;

/** PATCH /api/v1/me */
export const MeUpdateRequest = z.strictObject({ notifyOnFinish: z.boolean() });
export type MeUpdateRequest = z.infer<typeof MeUpdateRequest>;

/** One member in the admin's list. */
export const MemberRow = z.object({
  id: z.uuid(),
  login: z.string(),
  displayName: z.string().nullable(),
  email: z.string().nullable(),
  role: Role,
  createdAt: z.iso.datetime(),
});
export type MemberRow = z.infer<typeof MemberRow>;

/** GET /api/v1/users */
export const MembersResponse = z.object({ users: z.array(MemberRow) });
export type MembersResponse = z.infer<typeof MembersResponse>;

/** PATCH /api/v1/users/:id */
export const MemberRoleRequest = z.strictObject({ role: Role });
export type MemberRoleRequest = z.infer<typeof MemberRoleRequest>;

export const MemberResponse = z.object({ user: MemberRow });
export type MemberResponse = z.infer<typeof MemberResponse>;

export const MemberIdParams = z.object({ id: z.uuid() });
export type MemberIdParams = z.infer<typeof MemberIdParams>;

/** POST /api/v1/keys */
export const ApiKeyCreateRequest = z.strictObject({
  userId: z.uuid(),
  name: z.string().trim().min(1).max(100),
  scopes: z
    .array(ApiScope)
    .min(1, 'give at least one scope')
    .refine((s) => new Set(s).size === s.length, { message: 'each scope at most once' }),
});
export type ApiKeyCreateRequest = z.infer<typeof ApiKeyCreateRequest>;

/** A key as listed: recognised by its prefix; the secret and its hash are never shown again. */
export const ApiKeyInfo = z.object({
  id: z.uuid(),
  name: z.string(),
  prefix: z.string(),
  scopes: z.array(ApiScope),
  owner: z.object({ id: z.uuid(), login: z.string() }),
  createdAt: z.iso.datetime(),
  lastUsedAt: z.iso.datetime().nullable(),
  revokedAt: z.iso.datetime().nullable(),
});
export type ApiKeyInfo = z.infer<typeof ApiKeyInfo>;

/** The answer of POST /api/v1/keys: the only time the secret is shown. */
export const ApiKeyCreatedResponse = z.object({ key: ApiKeyInfo, secret: z.string().startsWith('cairn_') });
export type ApiKeyCreatedResponse = z.infer<typeof ApiKeyCreatedResponse>;

/** GET /api/v1/keys?userId= */
export const ApiKeysQuery = z.object({ userId: z.uuid().optional() });
export type ApiKeysQuery = z.infer<typeof ApiKeysQuery>;

export const ApiKeysResponse = z.object({ keys: z.array(ApiKeyInfo) });
export type ApiKeysResponse = z.infer<typeof ApiKeysResponse>;

export const ApiKeyIdParams = z.object({ id: z.uuid() });
export type ApiKeyIdParams = z.infer<typeof ApiKeyIdParams>;
