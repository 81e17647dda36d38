// The player's hands, placed in the instrument frame so that fingertips sit on the courses and frets
// they claim: a right hand strumming or plucking over the rose or near the bridge, a left hand
// stopping a chord (or turning a peg). Poses are pure geometry; drawing follows the pose.
import { add, mix, ribbon, scaleOf, type Pt } from "./geom";
import { type Pen } from "./pen";
import { bodyHalf, courseY, neckHalf, stopX, type Geometry } from "./instrument";
import type { Palette } from "./look";
import type { LeftHandSpec, RightHandSpec } from "./types";

export type Finger = { joints: Pt[]; width: number; nail: boolean };
export type HandPose = { palm: Pt[]; fingers: Finger[]; wrist: Pt; elbow?: Pt; contact?: Pt };

/** One tapering outline per finger (round at the tip), a shadowed side, a lit side and a nail. */
function drawFinger(pen: Pen, f: Finger, pal: Palette) {
  const k = scaleOf(pen.m);
  const n = f.joints.length - 1;
  const widths = f.joints.map((_, i) => f.width * (1 - (0.2 * i) / n));
  const [a, b] = [f.joints[n - 1], f.joints[n]];
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  const dir: Pt = [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
  const r = widths[n] / 2;
  // Extend the centreline by a half-width so the ribbon's end rounds over the fingertip.
  const tip = (t: number): Pt => [b[0] + dir[0] * r * t, b[1] + dir[1] * r * t];
  const body = ribbon([...f.joints, tip(0.7), tip(1)], [...widths, widths[n] * 0.72, widths[n] * 0.1]);
  pen.smooth(body, { fill: pal.skin, stroke: "#4a2a18", sw: 2.2 });
  const side = (s: number) => f.joints.map((p, i) => add(p, [-dir[1] * s * widths[i], dir[0] * s * widths[i]]));
  pen.smooth(side(0.24), { stroke: pal.skinShadow, sw: f.width * k * 0.22, op: 0.35 }, false);
  pen.smooth(side(-0.18), { stroke: pal.skinLight, sw: f.width * k * 0.16, op: 0.35 }, false);
  for (let i = 1; i < n; i++) {
    const d = Math.hypot(f.joints[i + 1][0] - f.joints[i - 1][0], f.joints[i + 1][1] - f.joints[i - 1][1]) || 1;
    const nrm: Pt = [(-(f.joints[i + 1][1] - f.joints[i - 1][1]) / d) * widths[i] * 0.28, ((f.joints[i + 1][0] - f.joints[i - 1][0]) / d) * widths[i] * 0.28];
    pen.line(add(f.joints[i], nrm), add(f.joints[i], [-nrm[0], -nrm[1]]), { stroke: pal.skinShadow, sw: 1.2, op: 0.6 });
  }
  if (f.nail) {
    const ang = (Math.atan2(dir[1], dir[0]) * 180) / Math.PI;
    pen.ellipse(mix(a, b, 0.82), widths[n] * 0.24, widths[n] * 0.2, ang, { fill: pal.skinLight, stroke: pal.skinShadow, sw: 1, op: 0.75 });
  }
}

export function drawHand(pen: Pen, pose: HandPose, pal: Palette, name: string) {
  pen.group(name, () => {
    if (pose.contact) pen.ellipse(pose.contact, 9, 4, 0, { fill: "#1a0e06", op: 0.3 });
    // Lit at the knuckles, falling into shadow towards the wrist.
    const knuckles = pose.fingers.slice(0, 4).map((f) => f.joints[0]);
    const kc = knuckles.reduce((a, b) => [a[0] + b[0] / knuckles.length, a[1] + b[1] / knuckles.length] as Pt, [0, 0] as Pt);
    pen.smooth(pose.palm, { fill: pen.radial(mix(kc, pose.wrist, 0.25), 95, [[0, pal.skinLight], [0.5, pal.skin], [1, pal.skinShadow]]), stroke: "#4a2a18", sw: 2.4 });
    for (const k of knuckles) {
      pen.line(mix(pose.wrist, k, 0.4), mix(pose.wrist, k, 0.88), { stroke: pal.skinShadow, sw: 1.3, op: 0.3 });
      pen.ellipse(mix(pose.wrist, k, 0.93), 6, 4, 0, { fill: pal.skinLight, op: 0.45 });
    }
    for (const f of pose.fingers) drawFinger(pen, f, pal);
  });
}

const finger = (joints: Pt[], width: number, nail = true): Finger => ({ joints, width, nail });

/** Three-segment finger from knuckle k to tip t, bowed sideways by `bow` (mm). */
function arch(k: Pt, t: Pt, bow: number, width: number, nail = true): Finger {
  const d: Pt = [t[0] - k[0], t[1] - k[1]];
  const len = Math.hypot(d[0], d[1]) || 1;
  const nrm: Pt = [(-d[1] / len) * bow, (d[0] / len) * bow];
  return finger([k, add(mix(k, t, 0.42), nrm), add(mix(k, t, 0.75), [nrm[0] * 0.7, nrm[1] * 0.7]), t], width, nail);
}

export function rightHandPose(g: Geometry, spec: RightHandSpec): HandPose {
  // Over the rose the hand sits at its neck-side rim, so the rose itself stays in view.
  const hx = spec.over === "rose" ? g.rose.c[0] + g.rose.r + 16 : g.bridgeX + 62;
  const top = courseY(g, g.stringsPerCourse.length, hx) - 8;
  const low = courseY(g, 1, hx);
  const wrist: Pt = [hx + 22, top - 78];
  const knuckles: Pt[] = [[hx + 30, top - 12], [hx + 12, top - 6], [hx - 6, top - 8], [hx - 22, top - 14]];
  const palm: Pt[] = [[hx + 44, top - 40], [wrist[0] + 30, wrist[1] + 6], [wrist[0] - 28, wrist[1] - 2], [hx - 34, top - 40], [hx - 30, top - 8], [hx + 6, top + 2], [hx + 40, top - 6]];
  const fingers: Finger[] = [];
  let contact: Pt | undefined;
  if (spec.action === "strum") {
    const reach = spec.fingers === "extended" ? low + 26 - top : 30;
    knuckles.forEach((k, i) => {
      const t: Pt = [k[0] - 4 - (i - 1.5) * 5, k[1] + reach + [0, 8, 2, -12][i]];
      fingers.push(spec.fingers === "extended" ? arch(k, t, 3, 17 - i * 1.2) : arch(k, t, -9, 17 - i * 1.2, false));
    });
  } else {
    // Plucking: index and middle curl onto the upper courses, well apart from the thumb.
    fingers.push(arch(knuckles[0], [hx + 14, courseY(g, 2, hx) - 2], -7, 16));
    fingers.push(arch(knuckles[1], [hx - 2, courseY(g, 1, hx) - 1], -7, 16.5));
    fingers.push(arch(knuckles[2], [hx - 14, top + 26], -10, 15.5, false));
  }
  if (spec.littleFingerOnSoundboard) {
    const tip: Pt = [hx - 36, Math.min(low + 14, bodyHalf(g, hx - 36) - 12)];
    fingers.push(arch(knuckles[3], tip, 3, 13.5));
    contact = [tip[0] + 1, tip[1] + 6];
  } else if (fingers.length < 4) {
    fingers.push(arch(knuckles[3], [hx - 26, top + 14], -8, 14, false));
  }
  // The thumb lies along the strings towards the neck; apart from the fingers when plucking.
  const tb: Pt = [hx + 40, top - 30];
  const tt: Pt = spec.action === "pluck" ? [hx + 92, courseY(g, 4, hx + 92) - 1] : [hx + 72, top + 4];
  fingers.push(finger([tb, mix(tb, tt, 0.5), tt], 19));
  const elbow: Pt = [g.bridgeX + 20, -bodyHalf(g, g.bridgeX + 20) - 28];
  return { palm, fingers, wrist, elbow, contact };
}

export function leftHandPose(g: Geometry, spec: LeftHandSpec): HandPose {
  if (spec.action === "turn-peg") return pegPose(g, spec.peg);
  const tips = spec.stops.map((s) => ({ f: s.finger, t: [stopX(g, s.fret), courseY(g, s.course, stopX(g, s.fret))] as Pt }));
  const cx = tips.reduce((a, b) => a + b.t[0], 0) / Math.max(1, tips.length);
  const h = neckHalf(g, cx);
  const knuckle = (f: number): Pt => [cx + 26 - (f - 1) * 17, h + 18 + Math.abs(f - 2.5) * 3];
  const fingers: Finger[] = [];
  for (let f = 4; f >= 1; f--) {
    const stop = tips.find((s) => s.f === f);
    const k = knuckle(f);
    // Fingers not needed for the chord hover just off the treble edge.
    const t: Pt = stop ? stop.t : [k[0] - 6, h - 2];
    fingers.push(arch(k, t, -6, 15.5 - f * 0.6, !!stop));
  }
  const wrist: Pt = [cx + 20, h + 72];
  const palm: Pt[] = [[cx + 32, h + 14], [cx + 36, h + 44], [wrist[0] + 20, wrist[1]], [wrist[0] - 22, wrist[1] - 2], [cx - 34, h + 36], [cx - 28, h + 16], [cx, h + 10]];
  if (spec.thumbOverNeck) fingers.push(finger([[cx + 8, -h - 14], [cx + 12, -h - 3], [cx + 7, -h + 7]], 17));
  return { palm, fingers, wrist };
}

/** Tuning: thumb and index pinch the thumb-piece of a peg behind the head. */
function pegPose(g: Geometry, peg: number): HandPose {
  const [x, y] = g.pegs[peg];
  const knob: Pt = [x + 2, y - 31];
  const it: Pt = [knob[0] - 10, knob[1] + 1], tt: Pt = [knob[0] + 11, knob[1] - 1];
  const k1: Pt = [knob[0] - 28, knob[1] - 40], k2: Pt = [knob[0] - 42, knob[1] - 30];
  const wrist: Pt = [knob[0] - 14, knob[1] - 96];
  const fingers: Finger[] = [
    arch([k2[0] - 12, k2[1] - 14], [k2[0] - 24, k2[1] + 16], -8, 14, false),
    arch([k2[0] - 4, k2[1] - 4], [k2[0] - 10, k2[1] + 26], -8, 15, false),
    arch(k2, [it[0] - 16, it[1] + 12], -8, 15.5, true),
    arch(k1, it, -6, 16),
    finger([[knob[0] + 4, knob[1] - 60], [knob[0] + 14, knob[1] - 30], tt], 18),
  ];
  const palm: Pt[] = [k1, [knob[0] + 4, knob[1] - 58], [wrist[0] + 24, wrist[1]], [wrist[0] - 24, wrist[1] + 4], [k2[0] - 18, k2[1] - 20], k2];
  return { palm, fingers, wrist };
}
