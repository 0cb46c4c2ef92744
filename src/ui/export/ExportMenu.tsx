/** Placeholder for the export toolbar (project files, share link, PDF, images); replaced by its owner. */
export function ExportMenu() {
  return null;
}
