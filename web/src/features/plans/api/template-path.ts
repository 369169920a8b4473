export function templatePath(templateId?: string): string {
  return templateId
    ? `/api/countdown-templates/${encodeURIComponent(templateId)}`
    : '/api/countdown-templates';
}
