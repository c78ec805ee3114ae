import type { AuthResponse, LoginRequest, RegisterRequest, User } from '@homeground/shared';
import { httpClient } from '../../lib/http-client.js';

export function login(body: LoginRequest): Promise<AuthResponse> {
  return httpClient.post<AuthResponse>('/api/auth/login', body, { token: null });
}

export function register(body: RegisterRequest): Promise<AuthResponse> {
  return httpClient.post<AuthResponse>('/api/auth/register', body, { token: null });
}

/** The signed-in person, with their groups; 401 when the token is missing, expired or forged. */
export function getMe(token: string, signal?: AbortSignal): Promise<User> {
  return httpClient.get<User>('/api/me', { token, signal });
}
