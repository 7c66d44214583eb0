import { useEffect, useState } from 'react';

// The Barcode Detection API (https://wicg.github.io/shape-detection-api/#barcode-detection-api)
// is not in TypeScript's DOM library yet: the part this screen uses.
export interface DetectedBarcode {
  rawValue: string;
  format: string;
}

export interface QrDetector {
  detect(source: HTMLVideoElement): Promise<DetectedBarcode[]>;
}

interface BarcodeDetectorClass {
  new (options?: { formats?: string[] }): QrDetector;
  getSupportedFormats(): Promise<string[]>;
}

const detectorClass = () => (globalThis as { BarcodeDetector?: BarcodeDetectorClass }).BarcodeDetector;

/** A detector of QR codes, when the browser has one. */
export function createQrDetector(): QrDetector | null {
  const Detector = detectorClass();
  return Detector ? new Detector({ formats: ['qr_code'] }) : null;
}

/**
 * Whether this browser can read QR codes from the camera by itself: a BarcodeDetector that
 * knows `qr_code`, and camera access (only offered on https or localhost). Undefined while the
 * browser is asked.
 */
export function useQrCameraSupport(): boolean | undefined {
  const [supported, setSupported] = useState<boolean | undefined>(undefined);
  useEffect(() => {
    const Detector = detectorClass();
    if (!Detector || typeof navigator.mediaDevices?.getUserMedia !== 'function') {
      setSupported(false);
      return;
    }
    let live = true;
    Detector.getSupportedFormats().then(
      (formats) => live && setSupported(formats.includes('qr_code')),
      () => live && setSupported(false),
    );
    return () => {
      live = false;
    };
  }, []);
  return supported;
}

/** Words for a camera that would not start (getUserMedia's DOMException names). */
export function cameraErrorMessage(error: unknown): string {
  const name = error instanceof DOMException || error instanceof Error ? error.name : '';
  if (name === 'NotAllowedError' || name === 'SecurityError') {
    return "Gridkeep may not use the camera. Allow it in the browser's settings for this site, or type the serial.";
  }
  if (name === 'NotFoundError' || name === 'OverconstrainedError') return 'No camera was found on this device. Type the serial instead.';
  if (name === 'NotReadableError' || name === 'AbortError') return 'The camera is busy with another app. Close it and try again.';
  return 'The camera could not be started. Try again, or type the serial.';
}
