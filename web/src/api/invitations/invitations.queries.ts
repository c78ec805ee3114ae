import { queryOptions } from '@tanstack/react-query';
import { previewInvitation } from './invitations.api.js';

export const invitationKeys = {
  all: ['invitations'] as const,
  preview: (token: string) => [...invitationKeys.all, 'preview', token] as const,
};

export function invitationPreviewQueryOptions(token: string) {
  // A used or expired link answers 410 at once; asking again will not change that.
  return queryOptions({
    queryKey: invitationKeys.preview(token),
    queryFn: ({ signal }) => previewInvitation(token, signal),
    retry: false,
  });
}
