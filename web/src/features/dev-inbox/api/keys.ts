export const devMailKeys = {
  all: ['dev-mail'] as const,
  list: () => [...devMailKeys.all, 'list'] as const,
  detail: (id: string) => [...devMailKeys.all, 'detail', id] as const,
};
