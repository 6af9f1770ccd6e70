import { useQuery } from '@tanstack/react-query';
import type { Lot, Press } from '../types';
import { deskKey, useDeskCall } from './call';
import type { LotReport, MeasurementRow } from './types';

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

/**
 * Every current (not superseded) sampled part of a part spec's lots, one row each, for the
 * trend charts: one request, the server picks the current records (newest 1000 lots at most).
 */
export function useMeasurements(specId: string | undefined, filter: MeasurementFilter) {
  const { call, ready } = useDeskCall();
  return useQuery({
    queryKey: deskKey('measurements', specId, filter),
    queryFn: () => call<MeasurementRow[]>(`/trends/measurements${query({ specId, ...filter })}`),
    enabled: ready && !!specId,
  });
}
