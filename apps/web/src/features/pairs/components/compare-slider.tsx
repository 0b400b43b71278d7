import type { MediaAssetDto, PairCrop } from '@benchproof/contracts';
import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { cropStyle, useCropAspect } from './cropped-shot';
import { PairImage } from './pair-image';
import classes from './compare-slider.module.css';

const KEY_STEPS: Record<string, (p: number) => number> = {
  ArrowLeft: (p) => p - 2,
  ArrowRight: (p) => p + 2,
  PageDown: (p) => p - 20,
  PageUp: (p) => p + 20,
  Home: () => 0,
  End: () => 100,
};

const clamp = (p: number) => Math.max(0, Math.min(100, p));

/**
 * The after shot underneath, the before shot on top cut off at the divider. Drag anywhere
 * on the picture (finger, pen or mouse; pointer capture keeps the drag when the finger
 * leaves it) or focus the knob and use the arrow keys. Vertical swipes still scroll.
 */
export function CompareSlider({ before, after, crop }: { before: MediaAssetDto; after: MediaAssetDto; crop: PairCrop | null }) {
  const [pos, setPos] = useState(50);
  const [aspect, measure] = useCropAspect(crop);
  const box = useRef<HTMLDivElement>(null);
  const dragging = useRef(false);

  const moveTo = (clientX: number) => {
    const r = box.current?.getBoundingClientRect();
    if (r && r.width > 0) setPos(clamp(((clientX - r.left) / r.width) * 100));
  };
  const onDown = (e: PointerEvent<HTMLDivElement>) => {
    dragging.current = true;
    e.currentTarget.setPointerCapture(e.pointerId);
    moveTo(e.clientX);
  };
  const onMove = (e: PointerEvent<HTMLDivElement>) => dragging.current && moveTo(e.clientX);
  const onUp = () => (dragging.current = false);
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = KEY_STEPS[e.key];
    if (!step) return;
    e.preventDefault();
    setPos((p) => clamp(step(p)));
  };

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
      <span className={classes.label} data-side="before">Before</span>
      <span className={classes.label} data-side="after">After</span>
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
