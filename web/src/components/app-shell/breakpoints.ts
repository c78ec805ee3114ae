/**
 * Below this width the six navigation entries no longer fit beside the wordmark and account
 * button, so they fold into the menu button.
 */
export const NARROW_MEDIA = '@media (max-width: 1023px)';
export const WIDE_MEDIA = '@media (min-width: 1024px)';
