import passport from 'passport';
import { Strategy as GitHubStrategy, type Profile } from 'passport-github2';
import type { ServerContext, SignInProvider } from '../context';
import type { User } from '../entities/user.entity';
import { upsertSignedInMember } from '../services/members';
import { connectOrUnavailable } from '../db/connect-or-unavailable';

export const SIGN_IN_CALLBACK_PATH = '/api/v1/auth/github/callback';
export const SIGN_IN_SCOPE = ['read:user', 'user:email'];

/**
 * A passport instance of its own (not the global one), so each app in a process has its provider and
 * callback URL. GitHub's web flow with a random `state` kept in the session; the verify step creates or
 * refreshes the member.
 */
export function githubSignIn(ctx: ServerContext, provider: SignInProvider): passport.Authenticator {
  const authenticator = new passport.Passport();
  const options = {
    clientID: provider.clientID,
    clientSecret: provider.clientSecret,
    authorizationURL: provider.authorizationURL,
    tokenURL: provider.tokenURL,
    userProfileURL: provider.userProfileURL,
    userEmailURL: provider.userEmailURL,
    callbackURL: `${ctx.config.publicUrl}${SIGN_IN_CALLBACK_PATH}`,
    scope: SIGN_IN_SCOPE,
    userAgent: 'cairn',
    // The types say string; passport-oauth2 takes `true` for "generate one and check it in the session".
    state: true as unknown as string,
  };
  authenticator.use(
    'github',
    new GitHubStrategy(options, (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: User) => void) => {
      memberOf(ctx, profile).then(
        (user) => done(null, user),
        (err: unknown) => done(err),
      );
    }),
  );
  return authenticator;
}

async function memberOf(ctx: ServerContext, profile: Profile): Promise<User> {
  const source = await connectOrUnavailable(ctx.db);
  const login = profile.username;
  if (!/^\d{1,18}$/.test(profile.id) || !login) throw new Error('the sign-in provider sent no numeric user id or no login');
  return upsertSignedInMember(
    source,
    { githubId: String(profile.id), login, displayName: profile.displayName || null, email: profile.emails?.[0]?.value ?? null },
    ctx.config.adminLogin,
  );
}
