import { Camera, CameraOff } from 'lucide-react';
import { useCallback, useEffect, useRef, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { serialFromLabel } from '@/features/scan/utils/label-serial';
import { cameraErrorMessage, createQrDetector, useQrCameraSupport } from '@/features/scan/utils/qr-camera';

/** How often a frame is looked at for a QR code (ms): quick enough to feel instant, light on a phone. */
const lookEveryMs = 150;

interface CameraSession {
  stopped: boolean;
  stream?: MediaStream;
  timer?: number;
}

type CameraState = { kind: 'off' } | { kind: 'starting' } | { kind: 'on' } | { kind: 'failed'; message: string };

/**
 * "Use the camera": the rear camera looks for a cabinet's QR label and hands its serial to
 * `onSerial`. Shown only where the browser reads QR codes itself; the camera stops when a label
 * is found, when the person stops it, when the page is hidden and when the screen is left.
 */
export function CameraScanner({ onSerial }: { onSerial: (serial: string) => void }) {
  const supported = useQrCameraSupport();
  const sectionRef = useRef<HTMLElement>(null);
  const videoRef = useRef<HTMLVideoElement>(null);
  const session = useRef<CameraSession | null>(null);
  const onSerialRef = useRef(onSerial);
  const [state, setState] = useState<CameraState>({ kind: 'off' });
  const [otherCode, setOtherCode] = useState(false);

  useEffect(() => {
    onSerialRef.current = onSerial;
  }, [onSerial]);

  const stop = useCallback(() => {
    const s = session.current;
    session.current = null;
    if (!s) return;
    s.stopped = true;
    window.clearTimeout(s.timer);
    for (const track of s.stream?.getTracks() ?? []) track.stop();
    if (videoRef.current) videoRef.current.srcObject = null;
  }, []);

  useEffect(() => {
    const stopWhenHidden = () => {
      if (document.visibilityState !== 'hidden' || !session.current) return;
      stop();
      setState({ kind: 'off' });
    };
    document.addEventListener('visibilitychange', stopWhenHidden);
    return () => {
      document.removeEventListener('visibilitychange', stopWhenHidden);
      stop();
    };
  }, [stop]);

  // On a phone the picture opens below the serial field: bring it into view.
  const starting = state.kind === 'starting';
  useEffect(() => {
    if (starting) sectionRef.current?.scrollIntoView({ block: 'start' });
  }, [starting]);

  const start = async () => {
    stop();
    const detector = createQrDetector();
    const video = videoRef.current;
    if (!detector || !video) return;
    const s: CameraSession = { stopped: false };
    session.current = s;
    setState({ kind: 'starting' });
    setOtherCode(false);
    try {
      const stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
      if (s.stopped) {
        for (const track of stream.getTracks()) track.stop();
        return;
      }
      s.stream = stream;
      video.srcObject = stream;
      await video.play();
      if (s.stopped) return;
      setState({ kind: 'on' });

      const look = async () => {
        if (s.stopped) return;
        try {
          if (video.readyState >= HTMLMediaElement.HAVE_CURRENT_DATA) {
            const codes = await detector.detect(video);
            if (s.stopped) return;
            for (const code of codes) {
              const serial = serialFromLabel(code.rawValue);
              if (serial) {
                stop();
                setState({ kind: 'off' });
                onSerialRef.current(serial);
                return;
              }
            }
            if (codes.length > 0) setOtherCode(true);
          }
        } catch {
          // A frame the detector could not read: the next one will do.
        }
        if (!s.stopped) s.timer = window.setTimeout(look, lookEveryMs);
      };
      void look();
    } catch (error) {
      if (s.stopped) return;
      stop();
      setState({ kind: 'failed', message: cameraErrorMessage(error) });
    }
  };

  if (!supported) return null;
  const live = state.kind === 'starting' || state.kind === 'on';

  return (
    <section ref={sectionRef} aria-label="Scan with the camera" className="scroll-mt-20 space-y-3">
      <div className={live ? 'relative overflow-hidden rounded-md bg-ink-950' : 'hidden'}>
        <video
          ref={videoRef}
          playsInline
          muted
          className="block aspect-[3/4] max-h-[60dvh] w-full object-cover sm:aspect-video"
          aria-label="Camera view"
        />
        {/* A frame to aim with; the detector looks at the whole picture. */}
        <div className="pointer-events-none absolute inset-0 flex items-center justify-center" aria-hidden="true">
          <div className="aspect-square w-3/5 max-w-[16rem] rounded-lg border-4 border-amber-400/90 shadow-[0_0_0_100vmax_rgba(0,0,0,0.35)]" />
        </div>
      </div>

      {live ? (
        <>
          <p className="text-base text-stone-700" aria-live="polite">
            {state.kind === 'starting'
              ? 'Starting the camera…'
              : otherCode
                ? 'That code is not a Gridkeep cabinet label. Aim at the label on the cabinet.'
                : "Aim at the cabinet's QR label. It opens as soon as it is read."}
          </p>
          <Button
            size="lg"
            className="w-full"
            onClick={() => {
              stop();
              setState({ kind: 'off' });
            }}
            icon={<CameraOff className="h-5 w-5" aria-hidden="true" />}
          >
            Stop the camera
          </Button>
        </>
      ) : (
        <>
          {state.kind === 'failed' ? <Alert tone="danger">{state.message}</Alert> : null}
          <Button size="lg" className="w-full" onClick={() => void start()} icon={<Camera className="h-5 w-5" aria-hidden="true" />}>
            Use the camera
          </Button>
        </>
      )}
    </section>
  );
}
