import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { QueueItem } from "@waymark/contract";
import { reviewKeys } from "./keys";

export function getReviewQueue(): Promise<QueueItem[]> {
  return api.get<{ queue: QueueItem[] }>("/reviews/queue").then((r) => r.queue);
}

export const reviewQueueQueryOptions = queryOptions({ queryKey: reviewKeys.queue, queryFn: getReviewQueue });

export function useReviewQueue() {
  return useQuery(reviewQueueQueryOptions);
}
