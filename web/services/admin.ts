import { http } from './http';
import type { Role, User } from './types';

export function listUsers(): Promise<User[]> {
  return http.get<User[]>('/api/admin/users');
}

export function updateUserRoles(userId: number, roles: Role[]): Promise<User> {
  return http.put<User>(`/api/admin/users/${encodeURIComponent(String(userId))}/roles`, { roles });
}
