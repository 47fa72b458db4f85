import { OAuth2Server } from 'oauth2-mock-server';

/** Who the fake provider says is signing in. */
export interface FakeGoogleIdentity {
  sub: string;
  email: string;
  emailVerified: boolean;
  name: string;
}

/** A running local OAuth 2.0 / OpenID provider standing in for Google. */
export interface OAuthFake {
  /** Base URL, e.g. http://localhost:3001 */
  url: string;
  /** Changes the identity returned to the next sign-in (tests, or the demo's env settings). */
  identitySet(identity: FakeGoogleIdentity): void;
  stop(): Promise<void>;
}

/** The identity used when none is given: the invented demo owner, so Google sign-in links to that account. */
export const DEFAULT_FAKE_IDENTITY: FakeGoogleIdentity = {
  sub: 'fake-google-100000000000000000001',
  email: 'owner@larchloaf.example',
  emailVerified: true,
  name: 'Maren Larchwood',
};

/**
 * Starts the local Google stand-in (oauth2-mock-server). Its `/authorize` redirects straight back
 * with a code; `/token` and `/userinfo` answer with the configured identity.
 * @param port - port to listen on (0 picks a free one)
 * @param identity - who signs in
 * @returns the running fake
 * @example
 * const fake = await oauthFakeStart(3001); // GOOGLE_AUTH_URL = `${fake.url}/authorize`
 */
export async function oauthFakeStart(port: number, identity: FakeGoogleIdentity = DEFAULT_FAKE_IDENTITY): Promise<OAuthFake> {
  let current = identity;
  const server = new OAuth2Server();
  await server.issuer.keys.generate('RS256');
  server.service.on('beforeTokenSigning', (token: { payload: Record<string, unknown> }) => {
    Object.assign(token.payload, { sub: current.sub, email: current.email, email_verified: current.emailVerified, name: current.name });
  });
  server.service.on('beforeUserinfo', (response: { body: unknown; statusCode: number }) => {
    const [given, ...family] = current.name.split(' ');
    response.body = {
      sub: current.sub,
      email: current.email,
      email_verified: current.emailVerified,
      name: current.name,
      given_name: given,
      family_name: family.join(' ') || undefined,
    };
  });
  await server.start(port, 'localhost');
  const url = `http://localhost:${server.address().port}`;
  server.issuer.url = url;
  return {
    url,
    identitySet(next) {
      current = next;
    },
    stop: () => server.stop(),
  };
}
