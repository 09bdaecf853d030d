import { useMutation } from '@tanstack/react-query';
import { apiFile } from '@/lib/api-client';
import { saveFile } from '@/lib/save-file';
import { csvPath, type DeskQuery } from '../model/desk-query';

const FILE_STEM: Record<DeskQuery['tab'], string> = {
  checks: 'checks', trips: 'trips', defects: 'defects', incidentNotes: 'incident-notes',
};

/** The name the file gets when the server does not name it: what it holds and the dates asked for. */
export function csvFileName(q: DeskQuery): string {
  const range = q.from || q.to ? `-${q.from ?? 'start'}-to-${q.to ?? 'now'}` : '';
  return `breakline-${FILE_STEM[q.tab]}${range}.csv`;
}

/** Downloads the filtered table as CSV (every page, the same order as on screen). */
export function useCsvExport() {
  return useMutation({
    mutationFn: async (q: DeskQuery) => {
      const { blob, fileName } = await apiFile(csvPath(q));
      saveFile(blob, fileName ?? csvFileName(q));
    },
  });
}
