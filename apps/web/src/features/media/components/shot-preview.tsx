import type { MediaAssetDto } from '@benchproof/contracts';
import { Center, Image, Loader } from '@mantine/core';
import { IconMovie, IconPhotoOff } from '@tabler/icons-react';
import { useEffect, useMemo, useState } from 'react';

const SIZE = 84;

/** The server's upright thumbnail once made; until then the local file (videos get an icon). */
export function ShotPreview({ file, asset }: { file: File; asset?: MediaAssetDto }) {
  const [broken, setBroken] = useState(false);
  const isImage = file.type.startsWith('image/');
  const local = useMemo(() => (isImage ? URL.createObjectURL(file) : null), [file, isImage]);
  useEffect(() => () => void (local && URL.revokeObjectURL(local)), [local]);
  const thumb = asset?.status === 'ready' ? (asset.urls.thumb ?? asset.urls.poster) : null;

  if (thumb) return <Image src={thumb} w={SIZE} h={SIZE} radius="md" fit="cover" alt={`Stored thumbnail of ${file.name}`} data-testid="stored-thumb" />;
  if (local && !broken) return <Image src={local} w={SIZE} h={SIZE} radius="md" fit="cover" alt={`Preview of ${file.name}`} onError={() => setBroken(true)} />;
  return (
    <Center w={SIZE} h={SIZE} bg="gray.1" style={{ borderRadius: 8 }}>
      {asset?.status === 'pending' ? <Loader size="sm" /> : isImage ? <IconPhotoOff size={32} /> : <IconMovie size={32} />}
    </Center>
  );
}
