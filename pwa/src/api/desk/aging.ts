import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { deskKey, useDeskCall } from './call';
import type { AgingSet, NewAgingSet } from './types';

export function useAgingSets(compoundId: string | undefined) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('aging', compoundId),
    queryFn: () => call<AgingSet[]>(`/compounds/${compoundId}/aging`),
    enabled: ready && !!compoundId,
  });
}

export function useAddAgingSet(compoundId: string) {
  const { call } = useDeskCall();
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: NewAgingSet) =>
      call<AgingSet>(`/compounds/${compoundId}/aging`, { method: 'POST', body }),
    onSuccess: () => client.invalidateQueries({ queryKey: deskKey('aging', compoundId) }),
  });
}
