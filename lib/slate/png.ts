// Native: no canvas to rasterise an SVG with; the Slate offers SVG and TikZ there instead.
export async function savePng(_filename: string, _svg: string): Promise<string> {
  return 'PNG export works in the web app; use SVG or TikZ here';
}
