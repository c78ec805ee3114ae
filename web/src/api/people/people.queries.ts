import { queryOptions } from '@tanstack/react-query';
import { listPeople } from './people.api.js';

export const peopleKeys = {
  all: ['people'] as const,
  list: () => [...peopleKeys.all, 'list'] as const,
};

export function peopleQueryOptions() {
  return queryOptions({ queryKey: peopleKeys.list(), queryFn: ({ signal }) => listPeople(signal) });
}
