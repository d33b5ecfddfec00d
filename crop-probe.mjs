import sharp from "sharp";
const [file, top, height, out] = process.argv.slice(2);
const meta = await sharp(file).metadata();
await sharp(file).extract({ left: 0, top: Number(top), width: meta.width, height: Math.min(Number(height), meta.height - Number(top)) }).toFile(out);
console.log(meta.width, meta.height);
