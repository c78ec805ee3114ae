import { useMutation, useQueryClient } from '@tanstack/react-query';
import { importSpeciesCsv } from './species-import.api.js';
import { speciesKeys } from './species.queries.js';

/** Checks a file without writing (`dryRun`), or imports it; a real import refreshes every species view. */
export function useImportSpeciesMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, dryRun }: { file: File; dryRun: boolean }) => importSpeciesCsv(file, dryRun),
    onSuccess: (result) => {
      if (!result.dryRun) void queryClient.invalidateQueries({ queryKey: speciesKeys.all });
    },
  });
}
