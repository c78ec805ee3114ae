import type {
  AuthResponse,
  ConfirmRegistrationRequest,
  LoginRequest,
  RegisterAccepted,
  RegisterRequest,
  User,
} from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

export function login(body: LoginRequest): Promise<AuthResponse> {
  return httpClient.post<AuthResponse>('/api/auth/login', body, { token: null });
}

/** Always "check your e-mail": the account is made when the e-mailed link is opened. */
export function register(body: RegisterRequest): Promise<RegisterAccepted> {
  return httpClient.post<RegisterAccepted>('/api/auth/register', body, { token: null });
}

/** Opens the e-mailed link: the new account's sign-in, and where the person was going. */
export function confirmRegistration(body: ConfirmRegistrationRequest): Promise<AuthResponse & { next: string | null }> {
  return httpClient.post<AuthResponse & { next: string | null }>('/api/auth/register/confirm', body, { token: null });
}

/** The signed-in person, with their groups; 401 when the token is missing, expired or forged. */
export function getMe(token: string, signal?: AbortSignal): Promise<User> {
  return httpClient.get<User>('/api/me', { token, signal });
}
