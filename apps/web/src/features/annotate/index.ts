export { AnnotateEditor, type AnnotateEditorProps } from './components/annotate-editor';
export { AnnotatedStill } from './components/annotated-still';
export { annotatedUrl, annotationQuery } from './api/annotation';
