/**
 * Kerfline's drawing colours and line weights, in one place. Our own palette: a pale
 * board, copper in a warm orange, cuts in slate blue, links in green, bare copper-side
 * wire in pewter, highlights in magenta and faults in red. Line weights are in board mm;
 * the link weight is about a 22 AWG wire (0.64 mm, check-values §11); an insulated link
 * gets a pale green sleeve about as wide as PVC hook-up wire of that gauge (1.6 mm, from memory).
 */
export interface SideStyle {
  board: string;
  boardEdge: string;
  copper: string;
  copperOpacity: number;
  hole: string;
  /** Copper-side solder joint around a lead (drawn only where `joints` is true). */
  joints: boolean;
  joint: string;
  jointEdge: string;
  lead: string;
  cut: string;
  link: string;
  linkOpacity: number;
  linkDash?: string;
  /** The sleeve drawn round an insulated link. */
  sleeve: string;
  wire: string;
  wireOpacity: number;
  wireDash?: string;
  bodyFill: string;
  bodyStroke: string;
  bodyOpacity: number;
  bodyDash?: string;
  /** Marks, values and pin letters are left off where the body is only a faint outline. */
  details: boolean;
  text: string;
  ruler: string;
}

export interface Theme {
  component: SideStyle;
  copper: SideStyle;
  highlight: string;
  fault: string;
  font: string;
  stroke: { edge: number; body: number; link: number; sleeve: number; wire: number; cut: number; band: number; highlight: number; fault: number };
}

export const THEME: Theme = {
  component: {
    board: '#ede3cc',
    boardEdge: '#a8966f',
    copper: '#d9823f',
    copperOpacity: 0.22,
    hole: '#40362a',
    joints: false,
    joint: '#c4c7cc',
    jointEdge: '#7d828a',
    lead: '#5b5f66',
    cut: '#35607f',
    link: '#2f7d4a',
    linkOpacity: 1,
    sleeve: '#b8d8c0',
    wire: '#8d939c',
    wireOpacity: 0.5,
    wireDash: '0.8 0.6',
    bodyFill: '#faf6ec',
    bodyStroke: '#3c3c3c',
    bodyOpacity: 1,
    details: true,
    text: '#1f1f1f',
    ruler: '#5a5a5a',
  },
  copper: {
    board: '#dccca8',
    boardEdge: '#9c8a64',
    copper: '#c8702c',
    copperOpacity: 1,
    hole: '#2d261d',
    joints: true,
    joint: '#c4c7cc',
    jointEdge: '#6d727a',
    lead: '#5b5f66',
    cut: '#1d4f73',
    link: '#2f7d4a',
    linkOpacity: 0.35,
    linkDash: '0.8 0.6',
    sleeve: '#b8d8c0',
    wire: '#9aa0a8',
    wireOpacity: 1,
    bodyFill: 'none',
    bodyStroke: '#3c3c3c',
    bodyOpacity: 0.3,
    bodyDash: '0.6 0.5',
    details: false,
    text: '#1f1f1f',
    ruler: '#5a5a5a',
  },
  highlight: '#d81b7a',
  fault: '#d32f2f',
  font: 'Helvetica, Arial, sans-serif',
  stroke: { edge: 0.25, body: 0.2, link: 0.64, sleeve: 1.6, wire: 0.7, cut: 0.4, band: 0.35, highlight: 0.35, fault: 0.35 },
};
