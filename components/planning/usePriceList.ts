'use client';
/** The studio's price list in the browser (owners and designers may read it), shared by the parts list, the quote form and settings. */
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api/client-fetch';
import type { PriceListDto } from '@/db/prices';

export function usePriceList() {
  return useQuery({ queryKey: ['price-list'], queryFn: () => apiFetch<PriceListDto>('/api/studio/prices') });
}
