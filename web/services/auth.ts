import { http } from './http';
import type { SessionInfo, SignInBody, SignUpBody, SignedInSession } from './types';

/** Where the browser goes to start the GitHub round trip (a full page navigation, not a fetch). */
export const GITHUB_SIGN_IN_PATH = '/auth/github';

export function fetchSession(): Promise<SessionInfo> {
  return http.get<SessionInfo>('/api/session');
}

export function signIn(body: SignInBody): Promise<SignedInSession> {
  return http.post<SignedInSession>('/api/auth/sign-in', body, { handleUnauthorized: false });
}

export function signUp(body: SignUpBody): Promise<SignedInSession> {
  return http.post<SignedInSession>('/api/auth/sign-up', body);
}

export function signOut(): Promise<void> {
  return http.post<void>('/api/auth/sign-out');
}
