export { ShowcaseLibrary } from './components/showcase-library';
export { TakeDownList } from './components/take-down-list';
