// Figures other than the player: listeners at a table, a woman at a window, a boy with a tambourine,
// dancers in the distance, a small dog. Each in its own frame, in millimetres.
import { frame, mul, ribbon, type Mat, type Pt } from "./geom";
import { type Pen } from "./pen";
import { drawHead, type HeadStyle } from "./head";
import { blend, type Palette } from "./look";
import { tambourine } from "./props";

/** A simple hand: a mitten of a palm with finger divisions, for figures whose hands are not evidence. */
function mitt(pen: Pen, c: Pt, angle: number, pal: Palette) {
  const a = (angle * Math.PI) / 180;
  const r = (x: number, y: number): Pt => [c[0] + x * Math.cos(a) - y * Math.sin(a), c[1] + x * Math.sin(a) + y * Math.cos(a)];
  pen.smooth([r(-35, -30), r(40, -34), r(75, -10), r(78, 14), r(40, 30), r(-35, 30)], { fill: pal.skin, stroke: "#4a2a18", sw: 2 });
  for (const y of [-12, 4, 18]) pen.line(r(40, y), r(72, y * 0.9), { stroke: pal.skinShadow, sw: 1.4 });
}

function bust(pen: Pen, pal: Palette, cloth: string, woman: boolean, sh = woman ? 160 : 180) {
  pen.smooth([[-40, -650], [40, -650], [50, -560], [0, -550], [-50, -560]], { fill: pal.skinShadow });
  pen.smooth([[-60, -585], [-sh, -530], [-sh - 10, -250], [-150, 0], [150, 0], [sh + 10, -250], [sh, -530], [60, -585]], { fill: pen.linear([-sh, -500], [sh, 0], [[0, blend(cloth, "#ffffff", 0.15)], [1, blend(cloth, "#000000", 0.55)]]), stroke: "#0a0604", sw: 2.4 });
  if (woman) pen.smooth([[-120, -560], [0, -590], [120, -560], [90, -470], [0, -450], [-90, -470]], { fill: pal.skin });
  pen.smooth([[-70, -595], [70, -595], [130, -530], [0, -500], [-130, -530]], { fill: pal.linen, stroke: pal.linenShadow, sw: 1.6 });
}

/** A drinker seated behind the table (whose top is at y = 0 of this frame), one hand on a glass. */
export function drinker(pen: Pen, at: Mat, head: HeadStyle, pal: Palette, cloth: string, turn: number) {
  pen.with(at, () => {
    bust(pen, pal, cloth, head.sex === "woman");
    for (const s of [-1, 1]) pen.smooth(ribbon([[s * 180, -500], [s * 230, -230], [s * 110, -60]], [100, 92, 80]), { fill: blend(cloth, "#000000", 0.3), stroke: "#0a0604", sw: 2 });
  });
  pen.with(mul(at, frame([turn * 20, -720], -turn * 8, 1)), () => drawHead(pen, head, pal, turn));
}

/** The drinker's hands resting on the table top: drawn after the table. */
export function drinkerHands(pen: Pen, at: Mat, pal: Palette) {
  pen.with(at, () => {
    mitt(pen, [-90, -50], 10, pal);
    mitt(pen, [95, -55], 170, pal);
  });
}

export function womanAtWindow(pen: Pen, at: Mat, pal: Palette) {
  pen.with(at, () => {
    bust(pen, pal, pal.cloth2, true);
    pen.smooth(ribbon([[170, -500], [260, -220], [80, -20]], [100, 90, 80]), { fill: pal.linen, stroke: pal.linenShadow, sw: 2 });
    mitt(pen, [40, -20], 190, pal);
  });
  pen.with(mul(at, frame([10, -720], 12, 1)), () => drawHead(pen, { sex: "woman", headwear: "bare", hair: "bun", beard: false, eyesClosed: false }, pal, -0.5));
}

/** A boy standing, beating a tambourine held up at his side. */
export function boy(pen: Pen, at: Mat, pal: Palette) {
  pen.with(at, () => {
    for (const s of [-1, 1]) {
      pen.smooth(ribbon([[s * 70, 0], [s * 80, 380], [s * 95, 760]], [130, 110, 90]), { fill: blend(pal.cloth, "#000000", 0.2), stroke: "#0a0604", sw: 2 });
      pen.smooth([[s * 95 - 60, 740], [s * 95 + 70, 740], [s * 95 + 80, 790], [s * 95 - 60, 790]], { fill: "#1b120c", stroke: "#000000", sw: 2 });
    }
    bust(pen, pal, pal.cloth2, false, 140);
    pen.smooth(ribbon([[-150, -500], [-300, -360], [-300, -560]], [90, 82, 74]), { fill: pal.cloth2Dark, stroke: "#0a0604", sw: 2 });
    pen.with(mul(at, frame([-330, -700], 20, 1)), () => tambourine(pen, pal));
    mitt(pen, [-300, -580], -80, pal);
    pen.smooth(ribbon([[150, -500], [120, -300], [-120, -640]], [90, 82, 74]), { fill: pal.cloth2Dark, stroke: "#0a0604", sw: 2 });
    mitt(pen, [-150, -660], 200, pal);
  });
  pen.with(mul(at, frame([0, -700], 6, 1)), () => drawHead(pen, { sex: "man", headwear: "cap", hair: "short", beard: false, eyesClosed: false }, pal, -0.4));
}

/** A dancer with raised arms and a swinging skirt (or breeches), seen small in the distance. */
export function dancer(pen: Pen, at: Mat, pal: Palette, woman: boolean, swing: number) {
  pen.with(at, () => {
    if (woman) pen.smooth([[-120, -150], [120, -150], [360 + swing * 80, 780], [0, 820], [-320 + swing * 80, 760]], { fill: pen.linear([-300, 0], [300, 0], [[0, pal.cloth], [1, pal.clothDark]]), stroke: "#0a0604", sw: 2.4 });
    else {
      // A hop: one leg straight, the other knee raised.
      pen.smooth(ribbon([[-80, -120], [-110, 350], [-130, 800]], [150, 120, 90]), { fill: pal.cloth2, stroke: "#0a0604", sw: 2.4 });
      pen.smooth(ribbon([[80, -120], [260, 250], [200, 640]], [150, 120, 90]), { fill: pal.cloth2, stroke: "#0a0604", sw: 2.4 });
    }
    pen.smooth([[-60, -585], [-180, -530], [-150, -130], [150, -130], [180, -530], [60, -585]], { fill: woman ? pal.cloth2 : pal.cloth, stroke: "#0a0604", sw: 2.4 });
    // One arm thrown up, the other out and down, as in a turn of the dance.
    for (const s of [-1, 1]) {
      const up = s * swing > 0;
      const elbow: Pt = up ? [s * 280, -640] : [s * 300, -380];
      const hand: Pt = up ? [s * 300, -900] : [s * 440, -260];
      pen.smooth(ribbon([[s * 160, -530], elbow, hand], [100, 90, 80]), { fill: woman ? pal.linen : pal.clothDark, stroke: "#0a0604", sw: 2 });
      mitt(pen, hand, up ? -90 : s > 0 ? 20 : 160, pal);
    }
  });
  pen.with(mul(at, frame([0, -720], swing * 10, 1)), () => drawHead(pen, { sex: woman ? "woman" : "man", headwear: woman ? "cap" : "beret", hair: woman ? "bun" : "short", beard: !woman, eyesClosed: false }, pal, swing * 0.5));
}

export function dog(pen: Pen, at: Mat, pal: Palette) {
  pen.with(at, () => {
    const coat = blend(pal.linen, pal.woodLight, 0.4);
    for (const x of [-150, -100, 120, 170]) pen.poly([[x - 18, -60], [x + 18, -60], [x + 14, 150], [x - 14, 150]], { fill: coat, stroke: "#0a0604", sw: 2 });
    pen.smooth([[-220, -120], [0, -150], [200, -130], [230, -20], [0, 10], [-220, -10]], { fill: coat, stroke: "#0a0604", sw: 2.4 });
    pen.smooth([[170, -140], [260, -260], [340, -240], [360, -190], [300, -130], [220, -90]], { fill: coat, stroke: "#0a0604", sw: 2.4 });
    pen.smooth([[250, -250], [230, -170], [280, -200]], { fill: blend(coat, "#000000", 0.4), stroke: "#0a0604", sw: 2 });
    pen.circle([310, -220], 9, { fill: "#0a0604" });
    pen.path([["M", [-220, -100]], ["C", [-300, -160], [-300, -240], [-250, -280]]], { stroke: "#0a0604", sw: 30 });
    pen.path([["M", [-220, -100]], ["C", [-300, -160], [-300, -240], [-250, -280]]], { stroke: coat, sw: 24 });
  });
}
