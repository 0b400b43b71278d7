import { emptyDocument, type AnnotationDocument, type Shape } from '@benchproof/annotation';
import { ActionIcon, Badge, Box, Button, Center, Group, Loader, Text } from '@mantine/core';
import { useElementSize } from '@mantine/hooks';
import { IconArrowLeft, IconDownload } from '@tabler/icons-react';
import type Konva from 'konva';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router';
import { useAnnotation } from '../api/annotation';
import type { Style, Tool } from '../model/edit';
import { commit, redo, startHistory, undo, upsert } from '../model/history';
import { AnnotateCanvas } from './annotate-canvas';
import { AnnotateToolbar } from './annotate-toolbar';
import { ChainPanel } from './chain-panel';
import { LabelDialog, ScaleDialog } from './shape-dialogs';
import { useAutosave, type SaveState } from './use-autosave';
import { useEditorKeys } from './use-keys';
import { useView } from './use-view';

export interface AnnotateEditorProps {
  mediaId: number;
  /** The upright screen derivative of the photo or scope still. */
  imageUrl: string;
  backTo: string;
  title: string;
}

const SAVE_LABEL: Record<SaveState, [string, string]> = {
  saved: ['Saved', 'green'],
  dirty: ['Unsaved changes', 'yellow'],
  saving: ['Saving…', 'blue'],
  conflict: ['Changed elsewhere: reload', 'red'],
  error: ['Not saved: retrying on next change', 'red'],
};

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
  if (!annotation.data || !image) return <Center h="100dvh"><Loader /></Center>;
  const doc = annotation.data.document ?? emptyDocument(image.naturalWidth, image.naturalHeight);
  return <EditorBody {...props} image={image} initial={doc} version={annotation.data.version} />;
}

function EditorBody({ mediaId, backTo, title, image, initial, version }: AnnotateEditorProps & { image: HTMLImageElement; initial: AnnotationDocument; version: number }) {
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
  const remove = () => selectedId && (setHistory((h) => commit(h, h.present.filter((s) => s.id !== selectedId))), setSelectedId(null));

  useEditorKeys(
    { undo: () => setHistory(undo), redo: () => setHistory(redo), remove, deselect: () => setSelectedId(null), tool: setTool, zoomIn: view.zoomIn, zoomOut: view.zoomOut },
    asking === null,
  );

  const onCommit = (s: Shape) => {
    const isNew = !history.present.some((x) => x.id === s.id);
    if (isNew && (s.kind === 'scale' || s.kind === 'label')) setAsking(s);
    else put(s);
  };

  /** The editor's own picture at the photo's pixel size (what the server burns in), as a PNG download. */
  const exportPng = () => {
    const stage = stageRef.current;
    if (!stage) return;
    const handles = stage.findOne('.handles');
    handles?.hide();
    const src = stage.toCanvas({ x: view.position.x, y: view.position.y, width: doc.image.width * view.scale, height: doc.image.height * view.scale, pixelRatio: 1 / view.scale });
    handles?.show();
    // Rounding in the pixel ratio can lose a row; draw into a canvas of exactly the photo's size.
    const out = document.createElement('canvas');
    out.width = doc.image.width;
    out.height = doc.image.height;
    out.getContext('2d')?.drawImage(src, 0, 0, out.width, out.height);
    const url = out.toDataURL('image/png');
    const a = document.createElement('a');
    a.href = url;
    a.download = `annotated-${mediaId}.png`;
    a.click();
  };

  const [label, colour] = SAVE_LABEL[save.state];
  return (
    <Box pos="fixed" inset={0} bg="dark.8" style={{ zIndex: 300, display: 'flex', flexDirection: 'column' }} data-testid="annotate-editor" data-shapes={history.present.length} data-zoom={view.zoom.toFixed(2)}>
      <Group justify="space-between" p={6} c="white" wrap="nowrap">
        <Group gap="xs" wrap="nowrap" style={{ minWidth: 0 }}>
          <ActionIcon component={Link} to={backTo} size={48} variant="subtle" color="gray.0" aria-label="Back"><IconArrowLeft /></ActionIcon>
          <Text fw={600} truncate>{title}</Text>
        </Group>
        <Group gap="xs" wrap="nowrap">
          <Badge color={colour} size="lg" data-testid="save-state">{label}</Badge>
          <Button size="md" h={48} onClick={() => void save.flush()} disabled={save.state === 'saved'}>Save</Button>
          <ActionIcon size={48} variant="light" aria-label="Download the annotated image" onClick={exportPng}><IconDownload /></ActionIcon>
        </Group>
      </Group>
      <AnnotateToolbar
        tool={tool} onTool={(t) => { setTool(t); if (t !== 'select') setSelectedId(null); }} style={style}
        onStyle={(s) => { setStyle(s); if (selected) put({ ...selected, ...s }); }}
        canUndo={history.past.length > 0} canRedo={history.future.length > 0}
        onUndo={() => setHistory(undo)} onRedo={() => setHistory(redo)} onDelete={selected ? remove : null}
        onZoomIn={view.zoomIn} onZoomOut={view.zoomOut}
      />
      <Box ref={boxRef} style={{ flex: 1, minHeight: 0, overflow: 'hidden' }} data-testid="annotate-stage">
        <AnnotateCanvas doc={doc} image={image} box={box} view={view} tool={tool} style={style} selectedId={selectedId} onSelect={setSelectedId} onCommit={onCommit} stageRef={stageRef} />
      </Box>
      {selected?.kind === 'ruler' && (
        <ChainPanel key={selected.id} mediaId={mediaId} doc={doc} ruler={selected} savedVersion={save.version} onPitches={(n) => put({ ...selected, pitches: n })} />
      )}
      <ScaleDialog opened={asking?.kind === 'scale'} onCancel={() => setAsking(null)} onDone={(mm) => { if (asking?.kind === 'scale') put({ ...asking, knownMm: mm }); setAsking(null); }} />
      {asking?.kind === 'label' && (
        <LabelDialog opened initial="" onCancel={() => setAsking(null)} onDone={(text) => { put({ ...asking, text }); setAsking(null); }} />
      )}
    </Box>
  );
}
