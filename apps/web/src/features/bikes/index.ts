export { bikeKeys, bikeQuery, useBike } from './api/bikes';
export { BikeChooser } from './components/bike-chooser';
export { BikeForm } from './components/bike-form';
export { BikeHistoryPanel } from './components/bike-history';
export { BikeSpecFields } from './components/bike-spec-fields';
export { BikeSpecs } from './components/bike-specs';
export { CustomerBikes } from './components/customer-bikes';
export { BIKE_FORM_MODEL, bikeFormToInput, bikeLabel, EMPTY_BIKE, type BikeFormValues } from './components/spec-labels';
