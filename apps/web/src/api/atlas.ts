import { AtlasList, type AtlasEntryView } from '@cairn/schema';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { fetchJson } from './client';

/** The filters of GET /api/v1/atlas that the page sends (strings as they go on the query line). */
export interface AtlasFilters {
  family?: string | undefined;
  rows?: number | undefined;
  cols?: number | undefined;
  rowsTo?: number | undefined;
  colsTo?: number | undefined;
  exact?: boolean | undefined;
}

export const ATLAS_PAGE_SIZE = 25;
/** The API hands out at most 100 entries a page. */
const API_PAGE_MAX = 100;

export function atlasPath(filters: AtlasFilters, limit: number, offset: number): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(filters)) if (v !== undefined && v !== '') q.set(k, String(v));
  q.set('limit', String(limit));
  q.set('offset', String(offset));
  return `/api/v1/atlas?${q}`;
}

/** One page of atlas entries for the table. */
export function useAtlasPage(filters: AtlasFilters, offset: number) {
  return useQuery({
    queryKey: ['atlas', 'page', filters, offset],
    queryFn: () => fetchJson(atlasPath(filters, ATLAS_PAGE_SIZE, offset), AtlasList),
    placeholderData: keepPreviousData,
  });
}

/** Beyond this the matrix says it shows a part, and the table has the rest. */
export const MATRIX_MAX_SIDE = 40;
/** 40 x 40 with rows <= cols is 820 entries; this leaves room for cylinders (not symmetric: 1600). */
const MATRIX_MAX_ENTRIES = MATRIX_MAX_SIDE * MATRIX_MAX_SIDE;

/** Every entry of a family with both sizes up to MATRIX_MAX_SIDE, fetched page by page for the matrix. */
export function useAtlasMatrix(family: string) {
  return useQuery({
    queryKey: ['atlas', 'matrix', family],
    queryFn: async () => {
      const entries: AtlasEntryView[] = [];
      let offset: number | null = 0;
      let total = 0;
      while (offset !== null && entries.length < MATRIX_MAX_ENTRIES) {
        const page: AtlasList = await fetchJson(atlasPath({ family, rowsTo: MATRIX_MAX_SIDE, colsTo: MATRIX_MAX_SIDE }, API_PAGE_MAX, offset), AtlasList);
        entries.push(...page.entries);
        total = page.total;
        offset = page.entries.length === 0 ? null : page.nextOffset;
      }
      return { entries, total };
    },
  });
}
