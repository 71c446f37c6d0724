import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { MyBookingsSchema } from '../../../../shared/schemas/booking-view.schemas';
import { apiGet } from '../../../lib/api-client';

export const bookingQueries = {
  all: () => ['bookings'] as const,
  mine: () =>
    queryOptions({
      queryKey: [...bookingQueries.all(), 'mine'] as const,
      queryFn: () => apiGet(apiPaths.myBookings, MyBookingsSchema),
    }),
};
