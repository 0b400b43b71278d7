import type { MediaAssetDto, PairCrop } from '@benchproof/contracts';
import { cropStyle, useCropAspect } from './cropped-shot';
import { PairImage } from './pair-image';
import { useDivider } from './use-divider';
import classes from './compare-slider.module.css';

/**
 * The after shot underneath, the before shot on top cut off at the divider. Drag anywhere
 * on the picture (finger, pen or mouse; pointer capture keeps the drag when the finger
 * leaves it) or focus the knob and use the arrow keys. Vertical swipes still scroll.
 */
export function CompareSlider({ before, after, crop }: { before: MediaAssetDto; after: MediaAssetDto; crop: PairCrop | null }) {
  const [aspect, measure] = useCropAspect(crop);
  const { pos, box, onDown, onMove, onUp, onKey } = useDivider();

  return (
    <div
      ref={box}
      className={classes.box}
      style={{ aspectRatio: String(aspect) }}
      data-testid="compare-slider"
      onPointerDown={onDown}
      onPointerMove={onMove}
      onPointerUp={onUp}
      onPointerCancel={onUp}
      onLoadCapture={(e) => measure(e.target as HTMLImageElement)}
    >
      <PairImage asset={after} alt="After" style={cropStyle(crop)} />
      <div className={classes.before} style={{ clipPath: `inset(0 ${100 - pos}% 0 0)` }}>
        <PairImage asset={before} alt="Before" style={cropStyle(crop)} />
      </div>
      <span className={classes.label} data-side="before">
        Before
      </span>
      <span className={classes.label} data-side="after">
        After
      </span>
      <div className={classes.divider} style={{ left: `${pos}%` }}>
        <div
          className={classes.knob}
          role="slider"
          tabIndex={0}
          aria-label="Divider between before and after"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={Math.round(pos)}
          aria-valuetext={`${Math.round(pos)} % before`}
          onKeyDown={onKey}
        >
          ‹ ›
        </div>
      </div>
    </div>
  );
}
