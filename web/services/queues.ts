import { http } from './http';
import type { QueueCounts } from './types';

export function fetchQueueCounts(): Promise<QueueCounts> {
  return http.get<QueueCounts>('/api/queues');
}
