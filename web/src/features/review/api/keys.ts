export const reviewKeys = {
  all: ['review-queue'] as const,
  queue: () => [...reviewKeys.all, 'list'] as const,
  markReviewed: () => [...reviewKeys.all, 'mark-reviewed'] as const,
};
