// Invented raceway pictures for the similar-case page test: a grey ring with stains or pits.
import sharp from "sharp";

export async function racewayJpeg(stain: string, spots: number): Promise<Buffer> {
  const dots = Array.from({ length: spots }, (_, i) => {
    const a = (i / spots) * Math.PI * 0.9 + 0.2;
    return `<circle cx="${320 + Math.cos(a) * 190}" cy="${240 - Math.sin(a) * 150}" r="${10 + (i % 3) * 6}" fill="${stain}" opacity="0.75"/>`;
  }).join("");
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="640" height="480">
    <defs><radialGradient id="g" cx="50%" cy="40%" r="70%"><stop offset="0" stop-color="#d7dde3"/><stop offset="1" stop-color="#6b7785"/></radialGradient></defs>
    <rect width="640" height="480" fill="#2b3138"/>
    <ellipse cx="320" cy="240" rx="260" ry="200" fill="url(#g)"/>
    <ellipse cx="320" cy="240" rx="150" ry="110" fill="#2b3138"/>
    ${dots}
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer();
}
