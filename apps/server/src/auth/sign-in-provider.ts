import type { Config } from '../config';
import type { SignInProvider } from '../context';
import { LOCAL_CLIENT_ID, LOCAL_CLIENT_SECRET } from '../dev/dev-services';

/** Real GitHub when its credentials are configured, else the local fake provider at `devUrl`. */
export function signInProvider(config: Config, devUrl: string | undefined): SignInProvider | undefined {
  if (config.github) {
    return {
      name: 'github',
      clientID: config.github.clientId,
      clientSecret: config.github.clientSecret,
      authorizationURL: 'https://github.com/login/oauth/authorize',
      tokenURL: 'https://github.com/login/oauth/access_token',
      userProfileURL: 'https://api.github.com/user',
      userEmailURL: 'https://api.github.com/user/emails',
    };
  }
  if (!devUrl) return undefined;
  return {
    name: 'local',
    clientID: LOCAL_CLIENT_ID,
    clientSecret: LOCAL_CLIENT_SECRET,
    authorizationURL: `${devUrl}/login/oauth/authorize`,
    tokenURL: `${devUrl}/login/oauth/access_token`,
    userProfileURL: `${devUrl}/user`,
    userEmailURL: `${devUrl}/user/emails`,
  };
}
