import { accessTokenFor } from '../auth/tokens';
import { ApiError, request, type RequestOptions } from './http';

/**
 * Calls the server as this person. When the server no longer takes their access token
 * (401), the token is refreshed once and the call repeated; a second 401 is passed on.
 */
export async function callAs<T>(
  userId: string,
  path: string,
  options: Omit<RequestOptions, 'token'> = {},
): Promise<T> {
  const token = await accessTokenFor(userId);
  try {
    return await request<T>(path, { ...options, token });
  } catch (error) {
    if (!(error instanceof ApiError && error.status === 401)) throw error;
    return request<T>(path, { ...options, token: await accessTokenFor(userId, token) });
  }
}
