import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { getMe } from '@/features/auth/api/me';

export interface ClubSettings {
  name: string;
  timeZone: string;
  latitude: number;
  longitude: number;
  pressureUnit: string;
  windUnit: string;
  awardCheck: string;
}

/** Saves the club's settings, then refreshes the session so this device uses them at once. */
export function useSaveClubSettings() {
  return useMutation({
    mutationFn: (settings: Partial<ClubSettings>) => apiRequest<ClubSettings>('/api/clubs/current', { method: 'PATCH', body: settings }),
    onSuccess: async () => {
      await getMe();
    },
  });
}
