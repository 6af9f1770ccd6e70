import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { deskKey, useDeskCall } from './call';
import type { DeskSpec, DeskSpecBody, DeskSpecDetail, DeskSpecRevision, NewSpec } from './types';

export function useSpecs() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('specs'),
    queryFn: () => call<DeskSpec[]>('/specs'),
    enabled: ready,
  });
}

export function useSpec(id: string | undefined) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('specs', id),
    queryFn: () => call<DeskSpecDetail>(`/specs/${id}`),
    enabled: ready && !!id,
  });
}

/** A write to a part spec; the list and every detail are read again afterwards. */
function useSpecMutation<I, O>(run: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: () => client.invalidateQueries({ queryKey: deskKey('specs') }),
  });
}

export function useCreateSpec() {
  const { call } = useDeskCall();
  return useSpecMutation((body: NewSpec) => call<DeskSpec>('/specs', { method: 'POST', body }));
}

/** Saves the editor's body: a new draft revision, or over the draft being edited. */
export function useSaveDraft(specId: string) {
  const { call } = useDeskCall();
  return useSpecMutation(({ revisionId, body }: { revisionId?: string; body: DeskSpecBody }) =>
    revisionId
      ? call<DeskSpecRevision>(`/specs/${specId}/revisions/${revisionId}`, { method: 'PUT', body })
      : call<DeskSpecRevision>(`/specs/${specId}/revisions`, { method: 'POST', body }),
  );
}

export function useReleaseRevision(specId: string) {
  const { call } = useDeskCall();
  return useSpecMutation((revisionId: string) =>
    call<DeskSpecRevision>(`/specs/${specId}/revisions/${revisionId}/release`, { method: 'POST' }),
  );
}
