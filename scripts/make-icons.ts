/**
 * Renders the app's icons from public/icon.svg: PNGs for the web manifest and home screens, and a
 * favicon.ico that wraps a 32 px PNG (ICO files may hold PNG images). Run after changing the SVG.
 */
import { readFile, writeFile } from "node:fs/promises";
import sharp from "sharp";

const svg = await readFile("public/icon.svg");
const png = (size: number) => sharp(svg, { density: Math.ceil((72 * size) / 32) }).resize(size, size).png().toBuffer();

for (const [name, size] of [["icon-192.png", 192], ["icon-512.png", 512], ["apple-touch-icon.png", 180]] as const) {
  await writeFile(`public/${name}`, await png(size));
}

const small = await png(32);
const header = Buffer.alloc(6 + 16);
header.writeUInt16LE(0, 0); // reserved
header.writeUInt16LE(1, 2); // 1 = icon
header.writeUInt16LE(1, 4); // one image
header.writeUInt8(32, 6); // width
header.writeUInt8(32, 7); // height
header.writeUInt8(0, 8); // no palette
header.writeUInt8(0, 9);
header.writeUInt16LE(1, 10); // colour planes
header.writeUInt16LE(32, 12); // bits per pixel
header.writeUInt32LE(small.length, 14);
header.writeUInt32LE(22, 18); // image data offset
await writeFile("public/favicon.ico", Buffer.concat([header, small]));
console.log("icons written to public/");
