import { emptyDocument, type AnnotationDocument } from '@benchproof/annotation';
import { Center, Loader } from '@mantine/core';
import { useElementSize } from '@mantine/hooks';
import type Konva from 'konva';
import { useEffect, useRef, useState } from 'react';
import { useAnnotation } from '../api/annotation';
import { AnnotateCanvas } from './annotate-canvas';
import classes from './annotate-editor.module.css';
import { AnnotateToolbar } from './annotate-toolbar';
import { AskDialogs } from './ask-dialogs';
import { EditorHeader } from './editor-header';
import { exportStagePng } from './export-png';
import { MeasureSheet } from './measure-sheet';
import { ToolHint } from './tool-hint';
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

function useLoadedImage(url: string): { img: HTMLImageElement | null; failed: boolean } {
  const [state, setState] = useState<{ img: HTMLImageElement | null; failed: boolean }>({ img: null, failed: false });
  useEffect(() => {
    const el = new window.Image();
    el.onload = () => setState({ img: el, failed: false });
    el.onerror = () => setState({ img: null, failed: true });
    el.src = url;
  }, [url]);
  return state;
}

/**
 * Full-screen annotation editor over the screen derivative; the original photo is never changed.
 * A photo that does not exist or belongs to another shop throws its NOT_FOUND to the route's
 * error page (the not-found page) instead of spinning.
 */
export function AnnotateEditor(props: AnnotateEditorProps) {
  const annotation = useAnnotation(props.mediaId);
  const image = useLoadedImage(props.imageUrl);
  if (annotation.error) throw annotation.error;
  if (image.failed && annotation.data) throw new Error('The photo could not be loaded. Go back and open it again.');
  if (!annotation.data || !image.img)
    return (
      <Center h="100dvh">
        <Loader />
      </Center>
    );
  const doc = annotation.data.document ?? emptyDocument(image.img.naturalWidth, image.img.naturalHeight);
  return <EditorBody {...props} image={image.img} initial={doc} version={annotation.data.version} />;
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
  const ed = useShapeEditing(initial.shapes, initial.image, view);
  const doc: AnnotationDocument = { ...initial, shapes: ed.shapes };
  const save = useAutosave(mediaId, doc, version, ed.saved);
  // The measurement sheet opens when a ruler is selected and stays shut once closed, until a ruler is tapped again.
  const [sheetClosed, setSheetClosed] = useState(false);
  const { selected } = ed;
  const onSelect = (id: string | null) => {
    setSheetClosed(false);
    ed.canvas.onSelect(id);
  };

  return (
    <div className={classes.editor} data-testid="annotate-editor" data-shapes={ed.shapes.length} data-zoom={view.zoom.toFixed(2)}>
      <EditorHeader backTo={backTo} title={title} save={save} onExport={() => exportStagePng(stageRef.current, view, doc.image, mediaId)} />
      <AnnotateToolbar {...ed.toolbar} />
      <div className={classes.stage}>
        <div ref={boxRef} className={classes.canvas} data-testid="annotate-stage">
          <AnnotateCanvas doc={doc} image={image} box={box} view={view} stageRef={stageRef} {...ed.canvas} onSelect={onSelect} />
        </div>
        <ToolHint tool={ed.toolbar.tool} />
        {selected?.kind === 'ruler' && !sheetClosed && (
          <MeasureSheet
            key={selected.id}
            mediaId={mediaId}
            doc={doc}
            ruler={selected}
            savedVersion={save.version}
            onPitches={(n) => ed.put({ ...selected, pitches: n })}
            onClose={() => setSheetClosed(true)}
          />
        )}
      </div>
      <AskDialogs asking={ed.asking} onDone={ed.put} onClose={ed.closeAsking} />
    </div>
  );
}
