/**
 * The canvas stylesheet. Lines follow the trade's conventions and stay distinguishable
 * without colour: scalars plain or dashed, fermions with an arrow at mid-line, gauge bosons
 * wavy (curly for gluon-like fields). Colours are our own quiet palette.
 */
import type { StylesheetJson } from 'cytoscape';

export const INK = '#27323a';
export const WARN = '#b3261e';
/** Marks of subgraphs pointed at from the workbench. */
export const MARK = '#2f6f8f';
const crossedCircle =
  'data:image/svg+xml;utf8,' +
  encodeURIComponent('<svg xmlns="http://www.w3.org/2000/svg" width="24" height="24"><circle cx="12" cy="12" r="10.5" fill="white" stroke="#27323a" stroke-width="2"/><path d="M5 5L19 19M19 5L5 19" stroke="#27323a" stroke-width="2"/></svg>');

export function canvasStyle(): StylesheetJson {
  return [
    {
      selector: 'node.vertex',
      style: {
        width: 14, height: 14, shape: 'ellipse', 'background-color': INK, 'border-width': 0,
        label: 'data(label)', 'font-size': 11, 'font-family': 'system-ui, sans-serif', color: '#4b5a64',
        'text-valign': 'top', 'text-halign': 'right', 'text-margin-x': 2, 'text-margin-y': -2,
      },
    },
    { selector: 'node.vertex.counterterm', style: { width: 22, height: 22, 'background-color': '#fff', 'background-image': crossedCircle, 'background-fit': 'contain' } },
    { selector: 'node.vertex.invalid', style: { 'border-width': 5, 'border-style': 'double', 'border-color': WARN, 'background-color': WARN } },
    { selector: 'node.vertex.line-start', style: { 'underlay-color': '#3f7d6e', 'underlay-opacity': 0.35, 'underlay-padding': 8, 'underlay-shape': 'ellipse' } },
    {
      selector: 'node.leg-end',
      style: {
        width: 16, height: 16, shape: 'ellipse', 'background-color': '#fff', 'border-width': 1, 'border-color': '#8a979f',
        label: 'data(label)', 'font-size': 10, 'text-valign': 'center', 'text-halign': 'center', color: '#4b5a64',
      },
    },
    {
      selector: 'edge',
      style: {
        'curve-style': 'unbundled-bezier', 'edge-distances': 'node-position', width: 2, 'line-color': INK, 'target-arrow-color': INK, 'mid-target-arrow-color': INK,
        'line-cap': 'round',
      },
    },
    { selector: 'edge[cpd]', style: { 'control-point-distances': 'data(cpd)', 'control-point-weights': 'data(cpw)' } },
    { selector: 'edge.loop', style: { 'curve-style': 'bezier', 'loop-direction': 'data(loopDirection)', 'loop-sweep': '-70deg', 'control-point-step-size': 56 } },
    { selector: 'edge.line-dashed', style: { 'line-style': 'dashed', 'line-dash-pattern': [7, 5] } },
    { selector: 'edge.line-arrow', style: { 'line-color': '#2f5d73', 'mid-target-arrow-color': '#2f5d73' } },
    { selector: 'edge.oriented', style: { 'mid-target-arrow-shape': 'triangle', 'arrow-scale': 1.3 } },
    { selector: 'edge.line-wavy, edge.line-curly', style: { 'line-color': '#7a5b1e', width: 1.8 } },
    { selector: 'edge.loop.line-wavy, edge.loop.line-curly', style: { 'line-style': 'dotted', width: 3 } },
    { selector: 'edge.leg', style: { width: 1.6, 'line-opacity': 0.85 } },
    { selector: 'edge.invalid', style: { 'line-color': WARN, width: 3.5, 'mid-target-arrow-color': WARN } },
    { selector: ':selected', style: { 'underlay-color': '#d9a441', 'underlay-opacity': 0.45, 'underlay-padding': 6 } },
    { selector: '.hovered', style: { 'underlay-color': '#3f7d6e', 'underlay-opacity': 0.3, 'underlay-padding': 7 } },
    // Subgraphs a panel points at, by nesting depth (1 = outermost member). Depth shows without
    // colour: lines get heavier and wider halos, vertices more rings; lines carry the innermost
    // member's name.
    { selector: 'edge.mark-1', style: { width: 4, 'underlay-color': MARK, 'underlay-opacity': 0.22, 'underlay-padding': 5 } },
    { selector: 'edge.mark-2', style: { width: 6, 'underlay-color': MARK, 'underlay-opacity': 0.32, 'underlay-padding': 9 } },
    { selector: 'edge.mark-3', style: { width: 8, 'underlay-color': MARK, 'underlay-opacity': 0.42, 'underlay-padding': 13 } },
    {
      selector: 'edge[markLabel]',
      style: {
        label: 'data(markLabel)', 'font-size': 11, 'font-family': 'system-ui, sans-serif', color: INK, 'text-background-color': '#ffffff',
        'text-background-opacity': 0.9, 'text-background-padding': '2px', 'text-background-shape': 'roundrectangle', 'text-border-width': 1,
        'text-border-color': MARK, 'text-border-opacity': 1,
      },
    },
    { selector: 'node.vertex.mark-1', style: { 'outline-width': 2, 'outline-color': MARK, 'outline-offset': 2, 'outline-opacity': 1 } },
    { selector: 'node.vertex.mark-2', style: { 'outline-width': 5, 'outline-style': 'double', 'outline-color': MARK, 'outline-offset': 2, 'outline-opacity': 1 } },
    { selector: 'node.vertex.mark-3', style: { 'outline-width': 8, 'outline-style': 'double', 'outline-color': MARK, 'outline-offset': 2, 'outline-opacity': 1, 'border-width': 2, 'border-color': '#ffffff' } },
  ];
}
