import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';

export const calendarKeys = {
  all: ['calendar'] as const,
  feed: () => [...calendarKeys.all, 'feed'] as const,
};

const FeedStatusSchema = z.object({ feed: z.object({ createdAt: z.string() }).nullable() });
const FeedLinkSchema = z.object({ url: z.string() });

export const CALENDAR_DOWNLOAD_PATH = '/api/calendar/download.ics';

/** Whether a private feed link exists (the link itself is shown only once, when made). */
export function useCalendarFeedQuery() {
  return useQuery({
    queryKey: calendarKeys.feed(),
    queryFn: ({ signal }) => api('/api/calendar/feed', { schema: FeedStatusSchema, signal }),
  });
}

/** Makes a new secret link; any earlier one stops working. */
export function useCreateCalendarFeedMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api('/api/calendar/feed', { method: 'POST', body: {}, schema: FeedLinkSchema }),
    onSuccess: () => client.invalidateQueries({ queryKey: calendarKeys.feed() }),
  });
}
