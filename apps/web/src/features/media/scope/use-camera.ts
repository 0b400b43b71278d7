import { useCallback, useEffect, useRef, useState } from 'react';

export interface CameraState {
  devices: MediaDeviceInfo[];
  deviceId: string | null;
  setDeviceId: (id: string) => void;
  error: string | null;
  live: boolean;
}

const explain = (e: unknown) =>
  e instanceof DOMException && e.name === 'NotAllowedError'
    ? 'The browser was not allowed to use the camera. Allow it in the site settings and try again.'
    : e instanceof DOMException && e.name === 'NotFoundError'
      ? 'No camera found. Plug the scope in and refresh the list.'
      : 'The camera could not be started.';

/** Lists cameras (a USB borescope is one) and streams the chosen one into the given video element. */
export function useCamera(video: React.RefObject<HTMLVideoElement | null>): CameraState & { refresh: () => void } {
  const [devices, setDevices] = useState<MediaDeviceInfo[]>([]);
  const [deviceId, setDeviceId] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [live, setLive] = useState(false);
  const stream = useRef<MediaStream | null>(null);
  const supported = typeof navigator !== 'undefined' && typeof navigator.mediaDevices?.getUserMedia === 'function';

  const refresh = useCallback(() => {
    void navigator.mediaDevices
      ?.enumerateDevices()
      .then((all) => setDevices(all.filter((d) => d.kind === 'videoinput')))
      .catch(() => setDevices([]));
  }, []);

  useEffect(() => {
    if (!supported) return;
    let cancelled = false;
    const constraints: MediaStreamConstraints = { video: deviceId ? { deviceId: { exact: deviceId } } : { facingMode: 'environment' }, audio: false };
    navigator.mediaDevices
      .getUserMedia(constraints)
      .then((s) => {
        if (cancelled) return s.getTracks().forEach((t) => t.stop());
        stream.current = s;
        if (video.current) video.current.srcObject = s;
        setError(null);
        setLive(true);
        refresh(); // labels appear only once permission is granted
      })
      .catch((e: unknown) => !cancelled && setError(explain(e)));
    return () => {
      cancelled = true;
      stream.current?.getTracks().forEach((t) => t.stop());
      stream.current = null;
      setLive(false);
    };
  }, [deviceId, refresh, video, supported]);

  return { devices, deviceId, setDeviceId, error: supported ? error : 'This browser cannot use a camera here (it needs a secure connection).', live, refresh };
}
