import { emptyDocument, type AnnotationDocument, type Shape } from '@benchproof/annotation';
import { Box, Center, Loader } from '@mantine/core';
import { useElementSize } from '@mantine/hooks';
import type Konva from 'konva';
import { useEffect, useRef, useState } from 'react';
import { useAnnotation } from '../api/annotation';
import type { Style, Tool } from '../model/edit';
import { commit, redo, startHistory, undo, upsert } from '../model/history';
import { AnnotateCanvas } from './annotate-canvas';
import { AnnotateToolbar } from './annotate-toolbar';
import { AskDialogs } from './ask-dialogs';
import { ChainPanel } from './chain-panel';
import { EditorHeader } from './editor-header';
import { exportStagePng } from './export-png';
import { useAutosave } from './use-autosave';
import { useEditorKeys } from './use-keys';
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
  const [history, setHistory] = useState(() => startHistory(initial.shapes));
  const [tool, setTool] = useState<Tool>('select');
  const [style, setStyle] = useState<Style>({ colour: 'amber', width: 'medium' });
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [asking, setAsking] = useState<Shape | null>(null);
  const stageRef = useRef<Konva.Stage>(null);
  const { ref: boxRef, width, height } = useElementSize();
  const doc: AnnotationDocument = { ...initial, shapes: history.present };
  const box = { width: Math.max(1, width), height: Math.max(1, height) };
  const view = useView(Math.min(box.width / doc.image.width, box.height / doc.image.height), box, doc.image);
  const save = useAutosave(mediaId, doc, version);
  const selected = history.present.find((s) => s.id === selectedId) ?? null;
  const put = (s: Shape) => setHistory((h) => commit(h, upsert(h.present, s)));
  const remove = () =>
    selectedId &&
    (setHistory((h) =>
      commit(
        h,
        h.present.filter((s) => s.id !== selectedId),
      ),
    ),
    setSelectedId(null));

  useEditorKeys(
    {
      undo: () => setHistory(undo),
      redo: () => setHistory(redo),
      remove,
      deselect: () => setSelectedId(null),
      tool: setTool,
      zoomIn: view.zoomIn,
      zoomOut: view.zoomOut,
    },
    asking === null,
  );

  const onCommit = (s: Shape) => {
    const isNew = !history.present.some((x) => x.id === s.id);
    if (isNew && (s.kind === 'scale' || s.kind === 'label')) setAsking(s);
    else put(s);
  };

  const exportPng = () => exportStagePng(stageRef.current, view, doc.image, mediaId);

  return (
    <Box
      pos="fixed"
      inset={0}
      bg="dark.8"
      style={{ zIndex: 300, display: 'flex', flexDirection: 'column' }}
      data-testid="annotate-editor"
      data-shapes={history.present.length}
      data-zoom={view.zoom.toFixed(2)}
    >
      <EditorHeader backTo={backTo} title={title} save={save} onExport={exportPng} />
      <AnnotateToolbar
        tool={tool}
        onTool={(t) => {
          setTool(t);
          if (t !== 'select') setSelectedId(null);
        }}
        style={style}
        onStyle={(s) => {
          setStyle(s);
          if (selected) put({ ...selected, ...s });
        }}
        canUndo={history.past.length > 0}
        canRedo={history.future.length > 0}
        onUndo={() => setHistory(undo)}
        onRedo={() => setHistory(redo)}
        onDelete={selected ? remove : null}
        onZoomIn={view.zoomIn}
        onZoomOut={view.zoomOut}
      />
      <Box ref={boxRef} style={{ flex: 1, minHeight: 0, overflow: 'hidden' }} data-testid="annotate-stage">
        <AnnotateCanvas
          doc={doc}
          image={image}
          box={box}
          view={view}
          tool={tool}
          style={style}
          selectedId={selectedId}
          onSelect={setSelectedId}
          onCommit={onCommit}
          stageRef={stageRef}
        />
      </Box>
      {selected?.kind === 'ruler' && (
        <ChainPanel
          key={selected.id}
          mediaId={mediaId}
          doc={doc}
          ruler={selected}
          savedVersion={save.version}
          onPitches={(n) => put({ ...selected, pitches: n })}
        />
      )}
      <AskDialogs asking={asking} onDone={put} onClose={() => setAsking(null)} />
    </Box>
  );
}
