import type { Tool } from '../model/edit';
import classes from './annotate-editor.module.css';

const HINTS: Record<Tool, string> = {
  select: 'Tap a mark to select it, drag to move it. Pinch to zoom.',
  ring: 'Ring: put your finger on the centre of the part and drag outwards. The ring grows from its centre.',
  arrow: 'Arrow: drag from the tail to where it points.',
  pen: 'Pen: draw freehand.',
  label: 'Label: tap where the note goes, then type it.',
  ruler: 'Measure: drag along what you measure; the length needs a scale on the photo.',
  scale: 'Set scale: drag along something of known length, e.g. a steel rule.',
  blur: 'Blur box: drag over a serial number or a face to hide it.',
};

/** One line over the top of the photo saying how the chosen tool draws; it never takes a tap. */
export function ToolHint({ tool }: { tool: Tool }) {
  return (
    <div className={classes.hint} role="status" data-testid="tool-hint">
      {HINTS[tool]}
    </div>
  );
}
