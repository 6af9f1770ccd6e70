import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { deskKey, useDeskCall } from './call';
import type {
  CompoundDetail,
  CompoundRecord,
  FitRecord,
  NewCompound,
  NewFit,
  NewTestSet,
  TestSet,
} from './types';

export function useCompounds() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('compounds'),
    queryFn: () => call<CompoundRecord[]>('/compounds'),
    enabled: ready,
  });
}

export function useCompound(id: string | undefined) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('compounds', id),
    queryFn: () => call<CompoundDetail>(`/compounds/${id}`),
    enabled: ready && !!id,
  });
}

/** A write to a compound; the list and every detail are read again afterwards. */
function useCompoundMutation<I, O>(run: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: () => client.invalidateQueries({ queryKey: deskKey('compounds') }),
  });
}

export function useCreateCompound() {
  const { call } = useDeskCall();
  return useCompoundMutation((body: NewCompound) =>
    call<CompoundRecord>('/compounds', { method: 'POST', body }),
  );
}

export function useUpdateCompound(id: string) {
  const { call } = useDeskCall();
  return useCompoundMutation((body: Partial<NewCompound>) =>
    call<CompoundRecord>(`/compounds/${id}`, { method: 'PATCH', body }),
  );
}

/** One POST per mode: the server keeps a test set per test. */
export function useAddTestSets(id: string) {
  const { call } = useDeskCall();
  return useCompoundMutation(async (sets: NewTestSet[]) => {
    const saved: TestSet[] = [];
    for (const body of sets) {
      saved.push(await call<TestSet>(`/compounds/${id}/test-sets`, { method: 'POST', body }));
    }
    return saved;
  });
}

/** Stores a fit as a draft version (the server fits again from the given start), then publishes it. */
export function useSaveFit(id: string) {
  const { call } = useDeskCall();
  return useCompoundMutation(
    async ({ fit, publishNote }: { fit: NewFit; publishNote?: string }) => {
      const saved = await call<FitRecord>(`/compounds/${id}/fits`, { method: 'POST', body: fit });
      if (publishNote === undefined) return saved;
      await call(`/compounds/${id}/fits/${saved.id}/publish`, {
        method: 'POST',
        body: { note: publishNote },
      });
      return saved;
    },
  );
}

export function usePublishFit(id: string) {
  const { call } = useDeskCall();
  return useCompoundMutation(({ fitId, note }: { fitId: string; note: string }) =>
    call<CompoundRecord>(`/compounds/${id}/fits/${fitId}/publish`, {
      method: 'POST',
      body: { note },
    }),
  );
}
