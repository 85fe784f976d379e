// Text inside hand-written SVG: escaped, because the SVG reaches the page through raw().
export const esc = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
