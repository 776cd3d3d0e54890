// The page the Chromium frame-time bench opens: one ConvectionCell, from the built package, with
// the grid and playback speed named in the query string.
import { createElement } from 'react';
import { createRoot } from 'react-dom/client';
import { convectionCell } from '../../dist/index.js';
import { ConvectionCell } from '../../dist/react/index.js';

const query = new URLSearchParams(location.search);
const size = Number(query.get('grid') ?? 64);
const params = { ...convectionCell.defaults, nx: size, nz: size, playbackSpeed: Number(query.get('speed') ?? 2), overlay: query.get('overlay') ?? 'streamlines' };
createRoot(document.getElementById('root')).render(createElement(ConvectionCell, { params, locale: 'en', reducedMotion: false, width: 640, seed: 1 }));
