export { ImportScreen } from './components/import-screen';
