/**
 * Rasterises an SVG document in the browser: the SVG is drawn onto a canvas sized from
 * its width in mm at `dpi` (1 in = 25.4 mm), then encoded as PNG.
 */
export async function svgToPng(svg: string, widthMm: number, heightMm: number, dpi: number): Promise<Uint8Array> {
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = Math.round((widthMm / 25.4) * dpi);
    canvas.height = Math.round((heightMm / 25.4) * dpi);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('this browser cannot draw on a canvas');
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (!blob) throw new Error('the PNG could not be encoded');
    return new Uint8Array(await blob.arrayBuffer());
  } finally {
    URL.revokeObjectURL(url);
  }
}
