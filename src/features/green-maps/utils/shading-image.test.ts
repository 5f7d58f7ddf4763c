import { expect, test } from "vitest";
import { heightRaster } from "../../../components/green-3d/surface-grid";
import { shadingBitmap, shadingDataUrl } from "./shading-image";

test("the shading bitmap is a 24-bit BMP of the raster, north row first, lighter where higher", () => {
  // Higher to the north: the top row must be the light colour, the bottom row the dark one.
  const map = {
    spacingM: 1,
    originM: [0, 0] as const,
    heightsM: [
      [0.1, 0.1],
      [0, 0],
    ],
  };
  const raster = heightRaster(map, 3);
  const bmp = shadingBitmap(raster);
  const view = new DataView(bmp.buffer);
  expect(String.fromCharCode(bmp[0]!, bmp[1]!)).toBe("BM");
  expect(view.getUint32(2, true)).toBe(bmp.length);
  expect(view.getInt32(18, true)).toBe(3);
  expect(view.getInt32(22, true)).toBe(-3);
  expect(view.getUint16(28, true)).toBe(24);
  const rowBytes = 12; // 3 pixels × 3 bytes, padded to 4
  const pixel = (r: number, c: number) => [...bmp.subarray(54 + r * rowBytes + c * 3, 57 + r * rowBytes + c * 3)].reverse();
  expect(pixel(0, 0)).toEqual([0xb4, 0xdd, 0x8e]);
  expect(pixel(2, 2)).toEqual([0x2b, 0x66, 0x38]);
  expect(shadingDataUrl(raster)).toMatch(/^data:image\/bmp;base64,Qk/);
});
