/** Server data for the administrator's pages (TanStack Query). */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useDeskCall } from './desk/call';
import type {
  Device,
  DeviceRevoked,
  MailMessage,
  MailSettings,
  Press,
  PressKind,
  Role,
  User,
} from './types';

const adminKey = (...parts: unknown[]) => ['admin', ...parts] as const;

function useAdminWrite<I, O>(area: string, run: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: () => client.invalidateQueries({ queryKey: adminKey(area) }),
  });
}

export function useUsers() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: adminKey('users'),
    queryFn: () => call<User[]>('/users'),
    enabled: ready,
  });
}

export interface NewUser {
  email: string;
  name: string;
  role: Role;
  password: string;
}

export function useCreateUser() {
  const { call } = useDeskCall();
  return useAdminWrite('users', (body: NewUser) => call<User>('/users', { method: 'POST', body }));
}

export function useChangeRole() {
  const { call } = useDeskCall();
  return useAdminWrite('users', ({ id, role }: { id: string; role: Role }) =>
    call<User>(`/users/${id}/role`, { method: 'PATCH', body: { role } }),
  );
}

export function useDeactivateUser() {
  const { call } = useDeskCall();
  return useAdminWrite('users', (id: string) =>
    call<User>(`/users/${id}/deactivate`, { method: 'POST' }),
  );
}

export function useAdminPresses() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: adminKey('presses'),
    queryFn: () => call<Press[]>('/presses'),
    enabled: ready,
  });
}

export interface NewPress {
  code: string;
  name: string;
  kind: PressKind;
  clampForceKn?: number;
}

export function useCreatePress() {
  const { call } = useDeskCall();
  return useAdminWrite('presses', (body: NewPress) =>
    call<Press>('/presses', { method: 'POST', body }),
  );
}

export function useUpdatePress() {
  const { call } = useDeskCall();
  return useAdminWrite(
    'presses',
    ({ id, ...body }: { id: string } & Partial<Omit<Press, 'id' | 'code'>>) =>
      call<Press>(`/presses/${id}`, { method: 'PATCH', body }),
  );
}

export function useMail() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: adminKey('mail'),
    queryFn: () => call<MailMessage[]>('/admin/mail'),
    enabled: ready,
    refetchInterval: 30_000,
  });
}

export function useMailSettings() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: adminKey('mail', 'settings'),
    queryFn: () => call<MailSettings>('/admin/mail/settings'),
    enabled: ready,
    refetchInterval: 30_000,
  });
}

/** One test message; the mail list and the queue counts are read again after it. */
export function useSendTestMail() {
  const { call } = useDeskCall();
  return useAdminWrite('mail', (to: string) =>
    call<{ queued: true }>('/admin/mail/test', { method: 'POST', body: { to } }),
  );
}

export function useDevices() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: adminKey('devices'),
    queryFn: () => call<Device[]>('/admin/devices'),
    enabled: ready,
  });
}

/** Ends every sign-in on a lost or stolen tablet. */
export function useRevokeDevice() {
  const { call } = useDeskCall();
  return useAdminWrite('devices', (deviceId: string) =>
    call<DeviceRevoked>(`/admin/devices/${deviceId}/revoke`, { method: 'POST' }),
  );
}
