/** Exports are plain downloads (the session cookie goes along): a link, not a fetch. */
export const recipeExportUrl = (id: number, format: 'json' | 'csv') => `/api/recipes/${id}/export?format=${format}`;
