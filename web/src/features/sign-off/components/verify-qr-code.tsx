import QRCode from 'qrcode';
import { useEffect, useState } from 'react';

/** The verify page's address drawn as a QR code, for a phone held over the printed sheet. */
export function VerifyQrCode({ url }: { url: string }) {
  const [image, setImage] = useState<string>();
  useEffect(() => {
    let current = true;
    void QRCode.toDataURL(url, { errorCorrectionLevel: 'M', margin: 2, scale: 4 }).then(
      (data) => current && setImage(data),
    );
    return () => {
      current = false;
    };
  }, [url]);
  return image ? (
    <img className="lw-sheet-qr" src={image} alt={`QR code of ${url}`} width={112} height={112} />
  ) : null;
}
