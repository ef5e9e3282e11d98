/**
 * A short video of a printed unit label, for chromium's fake camera (`--use-file-for-fake-video-capture`).
 * The label is a QR PNG made by the qrcode package, decoded back to pixels, set on white paper in a
 * 640×480 frame and written as Y4M (YUV 4:2:0): a plain text header, then per frame the word FRAME and
 * the luma plane followed by two quarter-size chroma planes. Grey paper and a black code need no colour,
 * so both chroma planes are the neutral 128. Chromium plays the file in a loop.
 */
import { writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import QRCode from 'qrcode';

const require = createRequire(import.meta.url);
// pngjs ships with qrcode (it writes the PNG); we read one back with it.
const { PNG } = require('pngjs') as { PNG: { sync: { read(buffer: Buffer): { width: number; height: number; data: Buffer } } } };

const WIDTH = 640;
const HEIGHT = 480;

/** Luma of every pixel of a PNG (RGBA), by the BT.601 weights Y4M's default colour space uses. */
function lumaOf(png: { width: number; height: number; data: Buffer }): Uint8Array {
	const luma = new Uint8Array(png.width * png.height);
	for (let i = 0; i < luma.length; i++) {
		const [r, g, b] = [png.data[i * 4], png.data[i * 4 + 1], png.data[i * 4 + 2]];
		// Video range: black is 16, white 235.
		luma[i] = 16 + Math.round(((0.299 * r + 0.587 * g + 0.114 * b) * 219) / 255);
	}
	return luma;
}

export async function labelPng(serial: string): Promise<Buffer> {
	return QRCode.toBuffer(serial, { type: 'png', scale: 8, margin: 4, errorCorrectionLevel: 'M' });
}

/** Writes `frames` identical frames of the label centred on white paper; returns the file's path. */
export async function writeLabelVideo(serial: string, path: string, frames = 10): Promise<string> {
	const png = PNG.sync.read(await labelPng(serial));
	if (png.width > WIDTH || png.height > HEIGHT) throw new Error(`the label (${png.width}×${png.height}) does not fit the frame`);
	const code = lumaOf(png);
	const y = new Uint8Array(WIDTH * HEIGHT).fill(235);
	const left = Math.floor((WIDTH - png.width) / 2);
	const top = Math.floor((HEIGHT - png.height) / 2);
	for (let row = 0; row < png.height; row++) y.set(code.subarray(row * png.width, (row + 1) * png.width), (top + row) * WIDTH + left);
	const chroma = new Uint8Array((WIDTH / 2) * (HEIGHT / 2)).fill(128);
	const frame = Buffer.concat([Buffer.from('FRAME\n'), y, chroma, chroma]);
	const header = Buffer.from(`YUV4MPEG2 W${WIDTH} H${HEIGHT} F10:1 Ip A1:1 C420jpeg\n`);
	writeFileSync(path, Buffer.concat([header, ...Array.from({ length: frames }, () => frame)]));
	return path;
}
