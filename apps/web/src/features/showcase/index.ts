export { ShowcaseLibrary } from './components/showcase-library';
