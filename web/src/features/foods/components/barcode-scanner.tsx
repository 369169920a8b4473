/**
 * The camera scanner: ZXing's browser reader (@zxing/browser over @zxing/library), loaded only when
 * the athlete opens it (React.lazy from the packaged-food panel), never with Today. Reads EAN-13
 * and UPC-A from the back camera, or from a photo of the barcode through the same reader.
 */
import { BarcodeFormat, BrowserMultiFormatOneDReader, type IScannerControls } from '@zxing/browser';
import { DecodeHintType } from '@zxing/library';
import { useEffect, useRef } from 'react';

function newReader(): BrowserMultiFormatOneDReader {
  const hints = new Map<DecodeHintType, unknown>([
    [DecodeHintType.POSSIBLE_FORMATS, [BarcodeFormat.EAN_13, BarcodeFormat.UPC_A]],
  ]);
  return new BrowserMultiFormatOneDReader(hints);
}

interface BarcodeScannerProps {
  /** The digits read (the server checks them again). */
  onCode: (code: string) => void;
  /** The camera could not be opened (no permission, no camera); the panel says so. */
  onProblem: (message: string) => void;
}

export function BarcodeScanner({ onCode, onProblem }: BarcodeScannerProps) {
  const video = useRef<HTMLVideoElement>(null);
  const done = useRef(false);
  const report = useRef({ onCode, onProblem });
  useEffect(() => {
    report.current = { onCode, onProblem };
  }, [onCode, onProblem]);

  useEffect(() => {
    let controls: IScannerControls | null = null;
    let stopped = false;
    const reader = newReader();
    if (!video.current) return;
    reader
      .decodeFromConstraints({ video: { facingMode: 'environment' } }, video.current, (result, _error, c) => {
        if (!result || done.current) return;
        done.current = true;
        c.stop();
        report.current.onCode(result.getText());
      })
      .then((c) => {
        controls = c;
        if (stopped) c.stop();
      })
      .catch(() =>
        report.current.onProblem(
          'The camera could not be opened. Allow the camera, choose a photo of the barcode, or type its number.',
        ),
      );
    return () => {
      stopped = true;
      controls?.stop();
    };
  }, []);

  return (
    <div className="space-y-2">
      <p className="text-sm text-ink-muted">Hold the barcode flat inside the frame, 10–20 cm away.</p>
      <video
        ref={video}
        aria-label="Camera view for the barcode"
        className="aspect-[4/3] w-full rounded-md border border-line-strong bg-ink object-cover"
        muted
        playsInline
      />
    </div>
  );
}

/** Reads a photo of a barcode through the same reader; null when nothing readable is in it. */
export async function readBarcodePhoto(file: File): Promise<string | null> {
  const url = URL.createObjectURL(file);
  try {
    return (await newReader().decodeFromImageUrl(url)).getText();
  } catch {
    return null;
  } finally {
    URL.revokeObjectURL(url);
  }
}
