import type { ShopSettingsDto, UpdateShopSettingsRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const shopSettingsQuery = queryOptions({ queryKey: ['shop', 'settings'], queryFn: () => api<ShopSettingsDto>('/shop/settings'), staleTime: 5 * 60_000 });

export const useShopSettings = () => useQuery(shopSettingsQuery);

export function useUpdateShopSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateShopSettingsRequest) => api<ShopSettingsDto>('/shop/settings', { method: 'PATCH', body }),
    onSuccess: (s) => qc.setQueryData(shopSettingsQuery.queryKey, s),
  });
}

/** Multipart upload of the report logo (field `file`). */
export function useUploadLogo() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const body = new FormData();
      body.append('file', file);
      return api<ShopSettingsDto>('/shop/logo', { method: 'POST', body });
    },
    onSuccess: (s) => qc.setQueryData(shopSettingsQuery.queryKey, s),
  });
}

export function useRemoveLogo() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<ShopSettingsDto>('/shop/logo', { method: 'DELETE' }),
    onSuccess: (s) => qc.setQueryData(shopSettingsQuery.queryKey, s),
  });
}
