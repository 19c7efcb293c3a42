import type {
  CreatePushSubscriptionRequest,
  PushDevice,
  PushDeviceListResponse,
  PushPublicKey,
  PushTestResponse,
} from '@peakwise/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { alertKeys } from '@/lib/alerts/query-keys';

const devicesKey = [...alertKeys.all, 'push-devices'] as const;

/** GET /api/push/key → the server's VAPID public key (the applicationServerKey). */
export function getPushKey(): Promise<PushPublicKey> {
  return api.get<PushPublicKey>('/push/key');
}

/** GET /api/push/subscriptions → the devices that get push alerts. */
export function listPushDevices(): Promise<PushDeviceListResponse> {
  return api.get<PushDeviceListResponse>('/push/subscriptions');
}

/** POST /api/push/subscriptions → 201 PushDevice (the same browser again updates its one row). */
export function addPushDevice(body: CreatePushSubscriptionRequest): Promise<PushDevice> {
  return api.post<PushDevice>('/push/subscriptions', body);
}

/** DELETE /api/push/subscriptions/:id → 204. */
export function removePushDevice(id: string): Promise<void> {
  return api.delete<void>(`/push/subscriptions/${id}`);
}

/** POST /api/push/subscriptions/:id/test → whether the push service took a test notification. */
export function testPushDevice(id: string): Promise<PushTestResponse> {
  return api.post<PushTestResponse>(`/push/subscriptions/${id}/test`);
}

export const pushDevicesQueryOptions = () => queryOptions({ queryKey: devicesKey, queryFn: listPushDevices });

export function usePushDevices() {
  return useQuery(pushDevicesQueryOptions());
}

function useDevicesMutation<A, R>(fn: (arg: A) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSettled: () => queryClient.invalidateQueries({ queryKey: devicesKey }) });
}

export const useAddPushDevice = () => useDevicesMutation(addPushDevice);
export const useRemovePushDevice = () => useDevicesMutation(removePushDevice);
export const useTestPushDevice = () => useDevicesMutation(testPushDevice);
