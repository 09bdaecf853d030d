import type { CheckResults, TemplateFields, TemplateItem, TemplateSection } from './types';

export const isAnswered = (item: TemplateItem, results: CheckResults) => results[item.id] !== undefined;

export function sectionDone(section: TemplateSection, results: CheckResults): boolean {
  return section.items.every((i) => isAnswered(i, results));
}

/** The 0-based section to resume at: the first with an unanswered item, or the review screen after the last. */
export function resumeSection(template: TemplateFields, results: CheckResults): number {
  const open = template.sections.findIndex((s) => !sectionDone(s, results));
  return open === -1 ? template.sections.length : open;
}

export function unansweredItems(template: TemplateFields, results: CheckResults): TemplateItem[] {
  return template.sections.flatMap((s) => s.items.filter((i) => !isAnswered(i, results)));
}

export function failedItems(template: TemplateFields, results: CheckResults): TemplateItem[] {
  return template.sections.flatMap((s) => s.items.filter((i) => results[i.id]?.outcome === 'fail'));
}
