/**
 * Plotly reads a small HTML subset in every piece of text it draws (<a href>, <b>, <br>,
 * <span style> …) and decodes entities. The person's text (case names, fixing, load and zone
 * labels, the title) goes through plotlyText so it is drawn as the characters typed, never as
 * markup: & < > become entities, which Plotly shows as the characters themselves.
 */
export function plotlyText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}
