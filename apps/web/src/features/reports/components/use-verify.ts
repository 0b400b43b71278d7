import { VerifyHashSchema } from '@benchproof/contracts';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { verifyReport } from '../api/reports';

/** SHA-256 of a file, computed in this browser (Web Crypto); the file never leaves the device. */
async function sha256Hex(file: File): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', await file.arrayBuffer());
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * The fingerprint being checked (from a link, typed, or hashed from a chosen PDF) and the
 * server's answer for it. A typed fingerprint that does not parse stays in the field with an error.
 */
export function useVerify(initialCode?: string) {
  const initial = VerifyHashSchema.safeParse(initialCode ?? '');
  const [typed, setTyped] = useState(initialCode ?? '');
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [hash, setHash] = useState<string | null>(initial.success ? initial.data : null);
  const [hashing, setHashing] = useState(false);
  const answer = useQuery({ queryKey: ['verify', hash], queryFn: () => verifyReport(hash ?? ''), enabled: hash !== null, retry: false, staleTime: Infinity });

  const checkTyped = () => {
    const parsed = VerifyHashSchema.safeParse(typed);
    setFieldError(parsed.success ? null : (parsed.error.issues[0]?.message ?? 'Not a fingerprint'));
    if (parsed.success) setHash(parsed.data);
  };
  const checkFile = (file: File) => {
    setHashing(true);
    void sha256Hex(file)
      .then(setHash)
      .finally(() => setHashing(false));
  };
  const busy = hashing || answer.isFetching;

  return { typed, setTyped, fieldError, answer, checkTyped, checkFile, busy };
}
