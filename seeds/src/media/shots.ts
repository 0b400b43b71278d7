import type { MediaArea, MediaPhase, MediaSource } from '@benchproof/domain';
import type { Framing, SceneName } from './scenes';

/** One generated demo shot and the EXIF it is written with (stored pixels turned to match). */
export interface DemoShot {
  scene: SceneName;
  phase: MediaPhase;
  area: MediaArea;
  source: MediaSource;
  caption: string;
  /** EXIF Orientation (CIPA DC-008): 1 upright, 3 upside down, 6 turned for 90° CW, 8 for 90° CCW. */
  orientation: 1 | 3 | 6 | 8;
  /** Made-up coordinates (open water), so stripping from derivatives is visible and testable. */
  gps: { lat: number; lon: number } | null;
  takenAt: string;
  /** How this shot is framed relative to the scene's reference framing (re-shoots drift). */
  framing?: Framing;
  /** True when the shot has no partner: a before/after pair finder must not pick it. */
  decoy?: boolean;
}

/**
 * The shots each demo job gets: before and after of the same parts (the after re-framed
 * as a re-shoot would be), two scope stills, and two decoys a pair finder must pass over.
 */
export const DEMO_SHOTS: DemoShot[] = [
  {
    scene: 'chain',
    phase: 'before',
    area: 'drivetrain',
    source: 'camera',
    caption: 'Chain as it came in: grime and surface rust',
    orientation: 6,
    gps: { lat: 50.1234, lon: -30.5678 },
    takenAt: '2026-03-02T09:14:00Z',
  },
  {
    scene: 'chain',
    phase: 'after',
    area: 'drivetrain',
    source: 'camera',
    caption: 'New chain fitted and lubricated',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-03T15:40:00Z',
    framing: { dx: 38, dy: -22, scale: 1.06, brightness: 0.08 },
  },
  {
    scene: 'cassette',
    phase: 'before',
    area: 'drivetrain',
    source: 'camera',
    caption: 'Worn teeth on the smallest sprockets',
    orientation: 3,
    gps: { lat: 50.1234, lon: -30.5678 },
    takenAt: '2026-03-02T09:16:00Z',
  },
  {
    scene: 'cassette',
    phase: 'after',
    area: 'drivetrain',
    source: 'camera',
    caption: 'Replacement cassette',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-03T15:42:00Z',
    framing: { dx: -30, dy: 18, scale: 0.95, brightness: -0.06 },
  },
  {
    scene: 'rotor',
    phase: 'before',
    area: 'brakes',
    source: 'camera',
    caption: 'Scored rotor with heat tint',
    orientation: 8,
    gps: { lat: 50.1234, lon: -30.5678 },
    takenAt: '2026-03-02T09:20:00Z',
  },
  {
    scene: 'rotor',
    phase: 'after',
    area: 'brakes',
    source: 'camera',
    caption: 'New rotor bedded in',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-03T15:45:00Z',
    framing: { dx: 24, dy: 30, scale: 1.04, brightness: 0.05 },
  },
  // Decoys: a drivetrain after shot of another part, and a during shot of the chain.
  {
    scene: 'jockey_wheels',
    phase: 'after',
    area: 'drivetrain',
    source: 'camera',
    caption: 'Jockey wheels cleaned',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-03T15:41:00Z',
    decoy: true,
  },
  {
    scene: 'chain',
    phase: 'during',
    area: 'drivetrain',
    source: 'camera',
    caption: 'Old chain off, measuring',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-03T10:05:00Z',
    framing: { dx: -60, dy: 40, scale: 1.15, brightness: 0 },
    decoy: true,
  },
  {
    scene: 'tube_interior',
    phase: 'before',
    area: 'frame_interior',
    source: 'scope',
    caption: 'Seat tube: rust spots near the bottom bracket',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-02T09:30:00Z',
  },
  {
    scene: 'tube_interior',
    phase: 'after',
    area: 'frame_interior',
    source: 'scope',
    caption: 'Seat tube after treatment',
    orientation: 1,
    gps: null,
    takenAt: '2026-03-03T15:50:00Z',
    framing: { dx: -16, dy: 12, scale: 1.08, brightness: 0 },
  },
];

/** How many demo jobs per shop get the shots (the most recent ones). */
export const DEMO_MEDIA_JOBS_PER_SHOP = 2;
