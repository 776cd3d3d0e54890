/** Drawing of the convection cell: the temperature field through a ramp, and the flow overlays. */

/** Ramp positions (0 … 255) from temperatures, clamped to [0, 1]. */
export function rampPositions(temperature: Float64Array, into: Float32Array, size = 256): Float32Array {
  const out = into.length === temperature.length ? into : new Float32Array(temperature.length);
  for (let k = 0; k < temperature.length; k += 1) out[k] = Math.min(Math.max(temperature[k]!, 0), 1) * (size - 1);
  return out;
}

/** Fills an nx × nz image, flipping rows so the solver's bottom row is drawn at the bottom. */
export function paintField(image: ImageData, positions: Float32Array, table: Uint8ClampedArray, nx: number, nz: number) {
  const pixels = image.data;
  for (let j = 0; j < nz; j += 1) {
    const row = (nz - 1 - j) * nx;
    for (let i = 0; i < nx; i += 1) {
      const entry = Math.round(positions[j * nx + i]!) * 3;
      const p = (row + i) * 4;
      pixels[p] = table[entry]!;
      pixels[p + 1] = table[entry + 1]!;
      pixels[p + 2] = table[entry + 2]!;
      pixels[p + 3] = 255;
    }
  }
}

/**
 * Contour lines of the stream function (streamlines of the steady part of the flow), by marching
 * squares over the cell centres. Segments come back as x0, z0, x1, z1 in cell units (0 … nx, 0 … nz).
 */
export function streamlineSegments(psi: Float64Array, nx: number, nz: number, levelsPerSign = 4): number[] {
  let largest = 0;
  for (const value of psi) largest = Math.max(largest, Math.abs(value));
  if (largest === 0) return [];
  const levels: number[] = [];
  for (let k = 1; k <= levelsPerSign; k += 1) levels.push((k / (levelsPerSign + 1)) * largest, (-k / (levelsPerSign + 1)) * largest);
  const segments: number[] = [];
  const at = (i: number, j: number) => psi[j * nx + i]!;
  for (const level of levels) {
    for (let j = 0; j < nz - 1; j += 1) {
      for (let i = 0; i < nx - 1; i += 1) {
        const corners = [at(i, j), at(i + 1, j), at(i + 1, j + 1), at(i, j + 1)] as const;
        const points: number[] = [];
        // Edges: bottom, right, top, left, each between two corners of the square.
        const edges = [[0, 1], [1, 2], [2, 3], [3, 0]] as const;
        const position = [[0, 0], [1, 0], [1, 1], [0, 1]] as const;
        for (const [a, b] of edges) {
          const va = corners[a];
          const vb = corners[b];
          if ((va < level) === (vb < level)) continue;
          const t = (level - va) / (vb - va);
          points.push(i + 0.5 + position[a][0] + (position[b][0] - position[a][0]) * t, j + 0.5 + position[a][1] + (position[b][1] - position[a][1]) * t);
        }
        for (let p = 0; p + 3 < points.length; p += 4) segments.push(points[p]!, points[p + 1]!, points[p + 2]!, points[p + 3]!);
      }
    }
  }
  return segments;
}

/** Dark under light, so a line reads on both ends of the ramp. */
function strokeTwice(ctx: CanvasRenderingContext2D, draw: () => void, width: number) {
  ctx.strokeStyle = 'rgba(12, 20, 30, 0.55)';
  ctx.lineWidth = width * 2.2;
  draw();
  ctx.strokeStyle = 'rgba(255, 253, 247, 0.9)';
  ctx.lineWidth = width;
  draw();
}

export function drawStreamlines(ctx: CanvasRenderingContext2D, segments: number[], nx: number, nz: number, width: number, height: number, line: number) {
  const sx = width / nx;
  const sz = height / nz;
  strokeTwice(ctx, () => {
    ctx.beginPath();
    for (let s = 0; s < segments.length; s += 4) {
      ctx.moveTo(segments[s]! * sx, height - segments[s + 1]! * sz);
      ctx.lineTo(segments[s + 2]! * sx, height - segments[s + 3]! * sz);
    }
    ctx.stroke();
  }, line);
}

export function drawArrows(ctx: CanvasRenderingContext2D, arrows: Float32Array, aspectRatio: number, width: number, height: number, line: number) {
  let fastest = 0;
  for (let k = 0; k < arrows.length; k += 4) fastest = Math.max(fastest, Math.hypot(arrows[k + 2]!, arrows[k + 3]!));
  if (fastest === 0) return;
  const spacing = height / 7;
  const scale = (0.8 * spacing) / fastest;
  strokeTwice(ctx, () => {
    ctx.beginPath();
    for (let k = 0; k < arrows.length; k += 4) {
      const x = (arrows[k]! / aspectRatio) * width;
      const y = height - arrows[k + 1]! * height;
      const dx = arrows[k + 2]! * scale;
      const dy = -arrows[k + 3]! * scale;
      const length = Math.hypot(dx, dy);
      if (length < 2) continue;
      const tipX = x + dx / 2;
      const tipY = y + dy / 2;
      ctx.moveTo(x - dx / 2, y - dy / 2);
      ctx.lineTo(tipX, tipY);
      const head = Math.min(8 * line, length / 2);
      const angle = Math.atan2(dy, dx);
      ctx.moveTo(tipX - head * Math.cos(angle - 0.5), tipY - head * Math.sin(angle - 0.5));
      ctx.lineTo(tipX, tipY);
      ctx.lineTo(tipX - head * Math.cos(angle + 0.5), tipY - head * Math.sin(angle + 0.5));
    }
    ctx.stroke();
  }, line);
}

export function drawParticles(ctx: CanvasRenderingContext2D, particles: Float32Array, aspectRatio: number, width: number, height: number, radius: number) {
  ctx.fillStyle = 'rgba(255, 253, 247, 0.95)';
  ctx.strokeStyle = 'rgba(12, 20, 30, 0.7)';
  ctx.lineWidth = radius * 0.6;
  ctx.beginPath();
  for (let k = 0; k < particles.length; k += 2) {
    const x = (particles[k]! / aspectRatio) * width;
    const y = height - particles[k + 1]! * height;
    ctx.moveTo(x + radius, y);
    ctx.arc(x, y, radius, 0, 2 * Math.PI);
  }
  ctx.fill();
  ctx.stroke();
}
