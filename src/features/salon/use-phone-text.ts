import { useQuery } from '@tanstack/react-query';
import { useCallback } from 'react';
import { formatPhone } from '@shared/format/phone';
import { DEFAULT_PHONE_COUNTRY } from '@shared/format/locale';
import { salonQueries } from './api/salon-queries';

/** Stored phone numbers as the salon's staff read them: national form for the salon's country, else with the country code. */
export function usePhoneText(): (stored: string) => string {
  const country = useQuery(salonQueries.current()).data?.country ?? DEFAULT_PHONE_COUNTRY;
  return useCallback((stored: string) => formatPhone(stored, country), [country]);
}
