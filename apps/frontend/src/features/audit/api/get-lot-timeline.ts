import { useQuery } from '@tanstack/react-query';
import { lotTimelineQueryOptions } from '@/lib/lots-api';

// Under ['lots'] so that whatever refreshes a lot refreshes its timeline too.
export const useLotTimeline = (lotId: number) => useQuery(lotTimelineQueryOptions(lotId));
