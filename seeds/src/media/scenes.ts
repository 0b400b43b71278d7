/**
 * Demo pictures drawn by the project as SVG (no photos from outside): bike parts on a
 * bench mat, in a "before" (grimy, worn, rusty) and an "after" (clean) state. The API's
 * seed renders them to JPEG with sharp.
 */
export type SceneName = 'chain' | 'cassette' | 'rotor' | 'tube_interior' | 'jockey_wheels';
export type SceneState = 'before' | 'after';

/**
 * How a second shot of the same subject differs from the first, as it does when a
 * mechanic re-shoots a part a day later: the camera a little off to the side (dx, dy in
 * scene pixels), a little nearer or farther (scale about the centre) and the light a
 * little brighter or dimmer (brightness −1..1, a white or black veil of that opacity).
 */
export interface Framing {
  dx: number;
  dy: number;
  scale: number;
  brightness: number;
}

export const SAME_FRAMING: Framing = { dx: 0, dy: 0, scale: 1, brightness: 0 };

export const SCENE_WIDTH = 1200;
export const SCENE_HEIGHT = 800;

interface Drawn {
  body: string;
  background: string;
}

const frame = ({ body, background }: Drawn, { dx, dy, scale, brightness }: Framing) => {
  const cx = SCENE_WIDTH / 2;
  const cy = SCENE_HEIGHT / 2;
  const veil = brightness === 0 ? '' : `<rect width="100%" height="100%" fill="${brightness > 0 ? '#ffffff' : '#000000'}" opacity="${Math.abs(brightness)}"/>`;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${SCENE_WIDTH}" height="${SCENE_HEIGHT}" viewBox="0 0 ${SCENE_WIDTH} ${SCENE_HEIGHT}">` +
    `<rect width="100%" height="100%" fill="${background}"/>` +
    `<g transform="translate(${cx + dx} ${cy + dy}) scale(${scale}) translate(${-cx} ${-cy})">${body}</g>${veil}` +
    // An "up" marker in the top-left corner, so a sideways thumbnail is obvious in the demo.
    `<path d="M60 110 L90 50 L120 110 Z" fill="#f5f5f0" opacity="0.85"/></svg>`
  );
};

/** A chain run across the frame: plates and rollers; grime and rust before, bright steel after. */
function chain(state: SceneState): Drawn {
  const plate = state === 'before' ? '#4a3b2c' : '#9aa3ab';
  const roller = state === 'before' ? '#6b4a2a' : '#c9d0d6';
  let links = '';
  for (let i = 0; i < 12; i++) {
    const x = 90 + i * 90;
    const y = 400 + Math.round(Math.sin(i / 2) * 40);
    links += `<rect x="${x}" y="${y - 34}" width="100" height="68" rx="34" fill="${plate}" stroke="#222" stroke-width="4"/>`;
    links += `<circle cx="${x + 20}" cy="${y}" r="20" fill="${roller}" stroke="#222" stroke-width="3"/>`;
    if (state === 'before' && i % 3 === 0) links += `<circle cx="${x + 60}" cy="${y + 18}" r="9" fill="#8b3a12" opacity="0.9"/>`;
  }
  return { body: links, background: state === 'before' ? '#2f4f3a' : '#2e5a44' };
}

/** A cassette seen face-on: concentric sprockets with teeth; worn "shark fin" teeth before. */
function cassette(state: SceneState): Drawn {
  let body = '';
  const cx = 600;
  const cy = 400;
  for (let ring = 0; ring < 7; ring++) {
    const r = 340 - ring * 42;
    const teeth = 44 - ring * 5;
    const points: string[] = [];
    for (let k = 0; k < teeth * 2; k++) {
      const a = (Math.PI * k) / teeth;
      const lean = state === 'before' && k % 2 === 0 ? 0.06 : 0;
      const rr = k % 2 === 0 ? r : r - 16;
      points.push(`${(cx + rr * Math.cos(a + lean)).toFixed(1)},${(cy + rr * Math.sin(a + lean)).toFixed(1)}`);
    }
    const fill = state === 'before' ? (ring % 2 ? '#5a5148' : '#4d443b') : ring % 2 ? '#b9c0c7' : '#a4acb4';
    body += `<polygon points="${points.join(' ')}" fill="${fill}" stroke="#1c1c1c" stroke-width="2"/>`;
  }
  body += `<circle cx="${cx}" cy="${cy}" r="60" fill="#2a2a2a"/><circle cx="${cx}" cy="${cy}" r="28" fill="#111"/>`;
  return { body, background: '#34404f' };
}

/** A disc-brake rotor with cut-outs; scoring and a blue heat tint before, even silver after. */
function rotor(state: SceneState): Drawn {
  const cx = 600;
  const cy = 400;
  let body = `<circle cx="${cx}" cy="${cy}" r="330" fill="${state === 'before' ? '#8c8f96' : '#c8ccd2'}" stroke="#333" stroke-width="6"/>`;
  if (state === 'before') {
    body += `<circle cx="${cx}" cy="${cy}" r="300" fill="none" stroke="#4b5f9e" stroke-width="30" opacity="0.45"/>`;
    for (let s = 0; s < 6; s++) body += `<circle cx="${cx}" cy="${cy}" r="${250 + s * 12}" fill="none" stroke="#5d5f63" stroke-width="2"/>`;
  }
  for (let h = 0; h < 18; h++) {
    const a = (2 * Math.PI * h) / 18;
    body += `<ellipse cx="${(cx + 270 * Math.cos(a)).toFixed(1)}" cy="${(cy + 270 * Math.sin(a)).toFixed(1)}" rx="16" ry="9" transform="rotate(${((a * 180) / Math.PI).toFixed(1)} ${(cx + 270 * Math.cos(a)).toFixed(1)} ${(cy + 270 * Math.sin(a)).toFixed(1)})" fill="#2b3340"/>`;
  }
  body += `<circle cx="${cx}" cy="${cy}" r="150" fill="#3b3f45"/><circle cx="${cx}" cy="${cy}" r="60" fill="#1e2227"/>`;
  for (let b = 0; b < 6; b++) {
    const a = (2 * Math.PI * b) / 6;
    body += `<circle cx="${(cx + 105 * Math.cos(a)).toFixed(1)}" cy="${(cy + 105 * Math.sin(a)).toFixed(1)}" r="14" fill="#aab0b8"/>`;
  }
  return { body, background: '#3d3a36' };
}

/** The inside of a frame tube through a scope: a dark bore, a ring light, rust spots before. */
function tubeInterior(state: SceneState): Drawn {
  let body = `<defs><radialGradient id="bore" cx="50%" cy="50%" r="55%"><stop offset="0%" stop-color="#050505"/><stop offset="60%" stop-color="#3c3a36"/><stop offset="100%" stop-color="#8d8a82"/></radialGradient></defs>`;
  body += `<circle cx="600" cy="400" r="380" fill="url(#bore)"/>`;
  for (let r = 120; r < 380; r += 55) body += `<circle cx="600" cy="400" r="${r}" fill="none" stroke="#a9a59b" stroke-width="2" opacity="0.35"/>`;
  if (state === 'before') {
    const spots = [
      [430, 260, 34],
      [760, 300, 22],
      [700, 560, 40],
      [480, 540, 18],
      [820, 460, 26],
      [380, 400, 15],
    ];
    for (const [x, y, r] of spots)
      body += `<circle cx="${x}" cy="${y}" r="${r}" fill="#9a4a1c" opacity="0.85"/><circle cx="${x + 6}" cy="${y - 5}" r="${Math.round(r / 2)}" fill="#c0682a" opacity="0.8"/>`;
  } else {
    body += `<circle cx="600" cy="400" r="330" fill="none" stroke="#c8b37a" stroke-width="18" opacity="0.35"/>`;
  }
  return { body, background: '#000000' };
}

/** A rear derailleur's two jockey wheels in their cage: a drivetrain shot with no before partner (a decoy for pairing). */
function jockeyWheels(state: SceneState): Drawn {
  let body = `<rect x="430" y="120" width="340" height="560" rx="150" fill="${state === 'before' ? '#3a3a3a' : '#5c6670'}" stroke="#111" stroke-width="6"/>`;
  for (const cy of [250, 550]) {
    const points: string[] = [];
    for (let k = 0; k < 22; k++) {
      const a = (Math.PI * k) / 11;
      const rr = k % 2 === 0 ? 110 : 92;
      points.push(`${(600 + rr * Math.cos(a)).toFixed(1)},${(cy + rr * Math.sin(a)).toFixed(1)}`);
    }
    body += `<polygon points="${points.join(' ')}" fill="#d8dde2" stroke="#111" stroke-width="3"/><circle cx="600" cy="${cy}" r="30" fill="#e0b030"/>`;
  }
  return { body, background: '#4a3f5a' };
}

/**
 * What stays put around each part between a before and an after shot (frame tubes,
 * tyre, workstand clamp, bench mat edge): in a real re-shoot this large, unchanged
 * layout is most of what a perceptual hash sees, while the part itself changes colour.
 */
const SURROUNDINGS: Record<SceneName, string> = {
  chain:
    `<polygon points="0,170 1200,90 1200,200 0,280" fill="#b3262e"/>` + // chainstay
    `<circle cx="1180" cy="760" r="300" fill="none" stroke="#151515" stroke-width="70"/>` + // tyre
    `<rect x="0" y="640" width="520" height="160" fill="#d9d2c0"/>`, // bench mat edge
  cassette:
    `<rect x="0" y="0" width="230" height="800" fill="#e3e3e3"/>` + // frame dropout and seatstay
    `<polygon points="900,0 1200,0 1200,800 1050,800" fill="#1a1a1a"/>`, // tyre side
  rotor:
    `<rect x="60" y="0" width="150" height="800" fill="#f0d040"/>` + // fork leg
    `<rect x="760" y="20" width="300" height="150" rx="30" fill="#202020"/>`, // caliper
  tube_interior: `<rect x="0" y="700" width="1200" height="100" fill="#6b6b6b"/>`, // scope shaft in view
  jockey_wheels:
    `<polygon points="0,0 500,0 300,800 0,800" fill="#e8e8e8"/>` + // bench wall
    `<circle cx="1100" cy="150" r="140" fill="#151515"/>`, // derailleur hanger bolt
};

const SCENES: Record<SceneName, (s: SceneState) => Drawn> = { chain, cassette, rotor, tube_interior: tubeInterior, jockey_wheels: jockeyWheels };

/** The SVG document of one demo scene, optionally re-framed as a second shot would be. */
export function drawScene(name: SceneName, state: SceneState, shift: Framing = SAME_FRAMING): string {
  const drawn = SCENES[name](state);
  return frame({ ...drawn, body: SURROUNDINGS[name] + drawn.body }, shift);
}
