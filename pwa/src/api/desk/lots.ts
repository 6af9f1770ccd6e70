import { useQuery } from '@tanstack/react-query';
import type { Lot, LotDetail, Press } from '../types';
import { deskKey, useDeskCall } from './call';
import { measurementRows } from './measurementRows';
import type { LotReport } from './types';

export interface LotFilter {
  specId?: string;
  pressId?: string;
  flagged?: boolean;
  from?: string;
  to?: string;
  limit?: number;
}

function query(params: object): string {
  const entries = Object.entries(params).filter(([, v]) => v !== undefined && v !== '');
  return entries.length ? `?${new URLSearchParams(entries.map(([k, v]) => [k, String(v)]))}` : '';
}

export function usePresses() {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('presses'),
    queryFn: () => call<Press[]>('/presses'),
    enabled: ready,
  });
}

export function useLots(filter: LotFilter) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('lots', filter),
    queryFn: () => call<Lot[]>(`/lots${query(filter)}`),
    enabled: ready,
  });
}

export function useLotReport(lotId: string | undefined) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('lot-report', lotId),
    queryFn: () => call<LotReport>(`/lots/${lotId}/report`),
    enabled: ready && !!lotId,
  });
}

/** The server's CSV of a lot report, as text, for a download the browser names. */
export function useLotReportCsv() {
  const { call } = useDeskCall();
  return (lotId: string) => call<string>(`/lots/${lotId}/report.csv`, { timeoutMs: 30_000 });
}

export interface MeasurementFilter {
  from?: string;
  to?: string;
  pressId?: string;
  cavity?: number;
}

/** Lots are fetched a few at a time: enough to be quick, few enough not to crowd the server. */
const PARALLEL_LOTS = 6;

async function inBatches<T, R>(
  items: T[],
  size: number,
  run: (item: T) => Promise<R>,
): Promise<R[]> {
  const out: R[] = [];
  for (let i = 0; i < items.length; i += size)
    out.push(...(await Promise.all(items.slice(i, i + size).map(run))));
  return out;
}

/**
 * Every current (not superseded) sampled part of a part spec's lots, one row each, for the
 * trend charts; built from the lot routes, newest 1000 lots at most.
 */
export function useMeasurements(specId: string | undefined, filter: MeasurementFilter) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('measurements', specId, filter),
    queryFn: async () => {
      const { cavity, ...server } = filter;
      const [lots, presses] = await Promise.all([
        call<Lot[]>(`/lots${query({ specId, ...server, limit: 1000 })}`),
        call<Press[]>('/presses'),
      ]);
      const wanted = lots.filter((lot) => cavity === undefined || lot.cavity === cavity);
      const details = await inBatches(wanted, PARALLEL_LOTS, (lot) =>
        call<LotDetail>(`/lots/${lot.id}`),
      );
      return measurementRows(details, presses);
    },
    enabled: ready && !!specId,
  });
}
