// The map's height shading as a small bitmap, one pixel per raster sample, that the SVG stretches smoothly over the
// green. Written as a 24-bit BMP by hand (a header and rows of pixels), so it needs no canvas: the same code runs in
// the browser and in tests.
import { heightColour, type HeightRaster } from "../../../components/green-3d/surface-grid";

/** A BMP file of the raster's height colours, row 0 (north) at the top. */
export function shadingBitmap(raster: HeightRaster): Uint8Array {
  const { cols, rows, values, minM, maxM } = raster;
  const rowBytes = Math.ceil((cols * 3) / 4) * 4;
  const size = 54 + rowBytes * rows;
  const bytes = new Uint8Array(size);
  const view = new DataView(bytes.buffer);
  bytes[0] = 0x42; // "B"
  bytes[1] = 0x4d; // "M"
  view.setUint32(2, size, true);
  view.setUint32(10, 54, true); // pixel data offset
  view.setUint32(14, 40, true); // BITMAPINFOHEADER
  view.setInt32(18, cols, true);
  view.setInt32(22, -rows, true); // negative: rows run top to bottom
  view.setUint16(26, 1, true);
  view.setUint16(28, 24, true);
  view.setUint32(34, rowBytes * rows, true);
  view.setInt32(38, 2835, true); // 72 dpi, either way
  view.setInt32(42, 2835, true);
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const [red, green, blue] = heightColour(values[r * cols + c]!, minM, maxM);
      const at = 54 + r * rowBytes + c * 3;
      bytes[at] = blue;
      bytes[at + 1] = green;
      bytes[at + 2] = red;
    }
  }
  return bytes;
}

export function shadingDataUrl(raster: HeightRaster): string {
  const bytes = shadingBitmap(raster);
  let text = "";
  for (let i = 0; i < bytes.length; i += 0x8000) text += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return `data:image/bmp;base64,${btoa(text)}`;
}
