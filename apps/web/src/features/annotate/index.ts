export { AnnotateEditor, type AnnotateEditorProps } from './components/annotate-editor';
export { annotatedUrl, annotationQuery } from './api/annotation';
