import { emptyDocument, type AnnotationDocument } from '@benchproof/annotation';
import { Box, Center, Loader } from '@mantine/core';
import { useElementSize } from '@mantine/hooks';
import type Konva from 'konva';
import { useEffect, useRef, useState } from 'react';
import { useAnnotation } from '../api/annotation';
import { AnnotateCanvas } from './annotate-canvas';
import { AnnotateToolbar } from './annotate-toolbar';
import { AskDialogs } from './ask-dialogs';
import { ChainPanel } from './chain-panel';
import { EditorHeader } from './editor-header';
import { exportStagePng } from './export-png';
import { useAutosave } from './use-autosave';
import { useShapeEditing } from './use-shape-editing';
import { useView } from './use-view';

export interface AnnotateEditorProps {
  mediaId: number;
  /** The upright screen derivative of the photo or scope still. */
  imageUrl: string;
  backTo: string;
  title: string;
}

function useLoadedImage(url: string): HTMLImageElement | null {
  const [img, setImg] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    const el = new window.Image();
    el.onload = () => setImg(el);
    el.src = url;
  }, [url]);
  return img;
}

/** Full-screen annotation editor over the screen derivative; the original photo is never changed. */
export function AnnotateEditor(props: AnnotateEditorProps) {
  const annotation = useAnnotation(props.mediaId);
  const image = useLoadedImage(props.imageUrl);
  if (!annotation.data || !image)
    return (
      <Center h="100dvh">
        <Loader />
      </Center>
    );
  const doc = annotation.data.document ?? emptyDocument(image.naturalWidth, image.naturalHeight);
  return <EditorBody {...props} image={image} initial={doc} version={annotation.data.version} />;
}

function EditorBody({
  mediaId,
  backTo,
  title,
  image,
  initial,
  version,
}: AnnotateEditorProps & { image: HTMLImageElement; initial: AnnotationDocument; version: number }) {
  const stageRef = useRef<Konva.Stage>(null);
  const { ref: boxRef, width, height } = useElementSize();
  const box = { width: Math.max(1, width), height: Math.max(1, height) };
  const view = useView(Math.min(box.width / initial.image.width, box.height / initial.image.height), box, initial.image);
  const ed = useShapeEditing(initial.shapes, view);
  const doc: AnnotationDocument = { ...initial, shapes: ed.shapes };
  const save = useAutosave(mediaId, doc, version);
  const { selected } = ed;

  return (
    <Box
      pos="fixed"
      inset={0}
      bg="dark.8"
      style={{ zIndex: 300, display: 'flex', flexDirection: 'column' }}
      data-testid="annotate-editor"
      data-shapes={ed.shapes.length}
      data-zoom={view.zoom.toFixed(2)}
    >
      <EditorHeader backTo={backTo} title={title} save={save} onExport={() => exportStagePng(stageRef.current, view, doc.image, mediaId)} />
      <AnnotateToolbar {...ed.toolbar} />
      <Box ref={boxRef} style={{ flex: 1, minHeight: 0, overflow: 'hidden' }} data-testid="annotate-stage">
        <AnnotateCanvas doc={doc} image={image} box={box} view={view} stageRef={stageRef} {...ed.canvas} />
      </Box>
      {selected?.kind === 'ruler' && (
        <ChainPanel
          key={selected.id}
          mediaId={mediaId}
          doc={doc}
          ruler={selected}
          savedVersion={save.version}
          onPitches={(n) => ed.put({ ...selected, pitches: n })}
        />
      )}
      <AskDialogs asking={ed.asking} onDone={ed.put} onClose={ed.closeAsking} />
    </Box>
  );
}
