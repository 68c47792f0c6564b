import { firmSettingsSchema, priceBookImportResultSchema, priceBookItemSchema, priceBookSchema, type FirmSettings, type PriceBookItemInput } from "@hushmark/schemas";
import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";

export const priceBookKeys = {
  all: ["price-book"] as const,
  list: () => [...priceBookKeys.all, "list"] as const,
  settings: () => [...priceBookKeys.all, "settings"] as const,
};

export const priceBookQueryOptions = () => queryOptions({ queryKey: priceBookKeys.list(), queryFn: ({ signal }) => api.get("/price-book", priceBookSchema, signal) });
export const usePriceBook = () => useQuery(priceBookQueryOptions());

export const firmSettingsQueryOptions = () => queryOptions({ queryKey: priceBookKeys.settings(), queryFn: ({ signal }) => api.get("/firm/settings", firmSettingsSchema, signal) });
export const useFirmSettings = (enabled = true) => useQuery({ ...firmSettingsQueryOptions(), enabled });

export function useUpdatePriceBookItem() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: Partial<PriceBookItemInput> }) => api.patch(`/price-book/items/${encodeURIComponent(id)}`, patch, priceBookItemSchema),
    onSuccess: () => qc.invalidateQueries({ queryKey: priceBookKeys.all }),
  });
}

export function useAddPriceBookItem() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (item: PriceBookItemInput) => api.post("/price-book/items", item, priceBookItemSchema), onSuccess: () => qc.invalidateQueries({ queryKey: priceBookKeys.all }) });
}

export function useImportPriceBook() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { csv: string; mode: "merge" | "replace" }) => api.post("/price-book/import", input, priceBookImportResultSchema),
    onSuccess: () => qc.invalidateQueries({ queryKey: priceBookKeys.all }),
  });
}

export function useSaveFirmSettings() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (s: FirmSettings) => api.put("/firm/settings", s, firmSettingsSchema), onSuccess: () => qc.invalidateQueries({ queryKey: priceBookKeys.settings() }) });
}

export const PRICE_BOOK_CSV_URL = "/api/v1/price-book/export.csv";
