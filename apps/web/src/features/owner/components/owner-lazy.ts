import { lazy } from 'react';

/*
 * The parts of the owner page that are not its first screen, each in its own chunk so a phone opening the
 * link cold downloads only the report view first: the confirm dialog (Modal, List, Checkbox and their focus
 * trap and scroll lock), the full-screen photo viewer, the before/after slider and the consent card.
 */
export const loadConfirmDecisions = () => import('./confirm-decisions');

export const ConfirmDecisions = lazy(async () => ({ default: (await loadConfirmDecisions()).ConfirmDecisions }));
export const ShotModal = lazy(async () => ({ default: (await import('./shot-modal')).ShotModal }));
export const PairSlider = lazy(async () => ({ default: (await import('./pair-slider')).PairSlider }));
export const ConsentCard = lazy(async () => ({ default: (await import('./consent-card')).ConsentCard }));
