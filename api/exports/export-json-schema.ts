import { z } from 'zod';
import { ExportDocument } from './exports.schemas';

/** The JSON Schema (draft 2020-12) of exports, generated from the zod schema the importer uses. */
export const exportJsonSchema = () => ({
  title: 'Cyclewright mechanism export, version 1',
  ...z.toJSONSchema(ExportDocument),
});
