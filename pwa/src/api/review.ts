/** Server data for the supervisor's review: lots, dispositions and photos (TanStack Query). */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useBlobUrl } from '../components/useBlobUrl';
import { useDeskCall } from './desk/call';
import type { Disposition, DispositionAction, Lot, LotDetail, LotReport } from './types';

const reviewKey = (...parts: unknown[]) => ['review', ...parts] as const;

export function useReviewQueue() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: reviewKey('queue'),
    queryFn: () => call<Lot[]>('/lots?flagged=true'),
    enabled: ready,
    refetchInterval: 60_000,
  });
}

export function useLotDetail(lotId: string | undefined) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: reviewKey('lot', lotId),
    queryFn: () => call<LotDetail>(`/lots/${lotId}`),
    enabled: ready && !!lotId,
  });
}

export interface DispositionInput {
  action: DispositionAction;
  note: string;
}

function useLotWrite<I, O>(run: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: () => client.invalidateQueries({ queryKey: reviewKey() }),
  });
}

export function useRecordDisposition(lotId: string) {
  const { call } = useDeskCall();
  return useLotWrite((body: DispositionInput) =>
    call<Disposition>(`/lots/${lotId}/dispositions`, { method: 'POST', body }),
  );
}

export function useReopenLot(lotId: string) {
  const { call } = useDeskCall();
  return useLotWrite((note: string) =>
    call<Lot>(`/lots/${lotId}/reopen`, { method: 'POST', body: { note } }),
  );
}

/** A photo from the server as an object URL: an <img> cannot send the bearer token itself. */
export function usePhotoUrl(sha256: string | null | undefined): string | undefined {
  const { call, ready } = useDeskCall();
  const { data } = useQuery({
    queryKey: reviewKey('photo', sha256),
    queryFn: () => call<Blob>(`/photos/${sha256}`, { expect: 'blob', timeoutMs: 60_000 }),
    enabled: ready && !!sha256,
    staleTime: Infinity,
  });
  return useBlobUrl(data, sha256 ?? undefined);
}

export function useLotReport(lotId: string) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: reviewKey('report', lotId),
    queryFn: () => call<LotReport>(`/lots/${lotId}/report`),
    enabled: ready,
  });
}

/** The server's CSV of the report, one row per sampled part, as text. */
export function useLotReportCsv() {
  const { call } = useDeskCall();
  return (lotId: string) => call<string>(`/lots/${lotId}/report.csv`, { timeoutMs: 30_000 });
}
