import { renderCsv } from './csv';
import type { ExportDocument, ExportFormat } from './exports.schemas';
import { renderLatex } from './latex';
import { renderMarkdown } from './markdown';
import { renderWorksheet } from './pdf/worksheet';

export interface RenderedExport {
  contentType: string;
  extension: string;
  body: string | Buffer;
}

/** Renders the export document in one format. */
export async function renderExport(doc: ExportDocument, format: ExportFormat): Promise<RenderedExport> {
  switch (format) {
    case 'md':
      return { contentType: 'text/markdown; charset=utf-8', extension: 'md', body: renderMarkdown(doc) };
    case 'tex':
      return { contentType: 'application/x-tex; charset=utf-8', extension: 'tex', body: renderLatex(doc) };
    case 'csv':
      return { contentType: 'text/csv; charset=utf-8', extension: 'csv', body: renderCsv(doc) };
    case 'json':
      return { contentType: 'application/json; charset=utf-8', extension: 'json', body: `${JSON.stringify(doc, null, 2)}\n` };
    case 'pdf':
      return { contentType: 'application/pdf', extension: 'pdf', body: await renderWorksheet(doc) };
  }
}
