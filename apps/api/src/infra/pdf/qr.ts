import QRCode from 'qrcode';

/** The dark modules of a QR code (ISO/IEC 18004, via the qrcode package) as one SVG path in module units. */
export function qrPath(text: string): { size: number; d: string } {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const size = qr.modules.size;
  const parts: string[] = [];
  for (let y = 0; y < size; y += 1) {
    for (let x = 0; x < size; x += 1) {
      if (qr.modules.data[y * size + x]) parts.push(`M${x} ${y}h1v1h-1z`);
    }
  }
  return { size, d: parts.join('') };
}
