import { cautionLines } from '../caution.js';

/** What the plan view needs (plain values in the user's units; no dependency on anchorage types). */
export interface AnchorPlanInput {
  title: string;
  forceUnit: string;
  lengthUnit: string;
  anchors: readonly { x: number; y: number; tension: number }[];
  /** 0-based index of the governing anchor. */
  governingAnchor: number;
  /** Direction of the horizontal force that governs, degrees counter-clockwise from +x. */
  directionDeg: number;
  cgPlan: readonly [number, number];
  centroid: readonly [number, number];
  /** Extra lines under the title (method, demand). */
  notes?: readonly string[];
}

export function escapeXml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

const fmt = (value: number) => Number(value.toPrecision(4)).toString();

/**
 * Plan view of an anchor pattern as SVG text: each anchor with its worst tension, the centre of
 * mass, and an arrow for the governing direction of the horizontal force. Equal scales on x and y.
 */
export function anchorPlanSvg(input: AnchorPlanInput): string {
  const width = 720;
  const notes = input.notes ?? [];
  const caution = cautionLines(110);
  const top = 40 + notes.length * 16;
  const plotSize = 440;
  const height = top + plotSize + 70 + caution.length * 14;
  const xs = [...input.anchors.map((a) => a.x), input.cgPlan[0]];
  const ys = [...input.anchors.map((a) => a.y), input.cgPlan[1]];
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const span = Math.max(maxX - minX, maxY - minY) || 1;
  const margin = span * 0.35;
  const scale = plotSize / (span + 2 * margin);
  const left = (width - plotSize) / 2;
  const midX = (minX + maxX) / 2;
  const midY = (minY + maxY) / 2;
  const px = (x: number) => left + plotSize / 2 + (x - midX) * scale;
  const py = (y: number) => top + plotSize / 2 - (y - midY) * scale;
  const maxTension = Math.max(...input.anchors.map((a) => a.tension), 0);

  const parts: string[] = [];
  parts.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="sans-serif" font-size="12">`,
  );
  parts.push(`<title>${escapeXml(input.title)}</title>`);
  parts.push(`<rect width="${width}" height="${height}" fill="white"/>`);
  parts.push(
    `<text x="${width / 2}" y="22" text-anchor="middle" font-size="15">${escapeXml(input.title)}</text>`,
  );
  notes.forEach((line, i) => {
    parts.push(
      `<text x="${width / 2}" y="${40 + i * 16}" text-anchor="middle" fill="#333">${escapeXml(line)}</text>`,
    );
  });
  parts.push(
    `<rect x="${left}" y="${top}" width="${plotSize}" height="${plotSize}" fill="none" stroke="#999" stroke-width="1"/>`,
  );
  parts.push(
    `<text x="${left + plotSize / 2}" y="${top + plotSize + 30}" text-anchor="middle">x (${escapeXml(input.lengthUnit)})</text>`,
  );
  parts.push(
    `<text x="${left - 36}" y="${top + plotSize / 2}" text-anchor="middle" transform="rotate(-90 ${left - 36} ${top + plotSize / 2})">y (${escapeXml(input.lengthUnit)})</text>`,
  );
  // Axis extremes as tick labels.
  const x0 = midX - plotSize / 2 / scale;
  const x1 = midX + plotSize / 2 / scale;
  const y0 = midY - plotSize / 2 / scale;
  const y1 = midY + plotSize / 2 / scale;
  parts.push(`<text x="${left}" y="${top + plotSize + 14}" text-anchor="start">${fmt(x0)}</text>`);
  parts.push(`<text x="${left + plotSize}" y="${top + plotSize + 14}" text-anchor="end">${fmt(x1)}</text>`);
  parts.push(`<text x="${left - 6}" y="${top + plotSize}" text-anchor="end">${fmt(y0)}</text>`);
  parts.push(`<text x="${left - 6}" y="${top + 10}" text-anchor="end">${fmt(y1)}</text>`);

  // Governing direction: an arrow through the centroid.
  const [cx, cy] = input.centroid;
  const rad = (input.directionDeg * Math.PI) / 180;
  const arrow = plotSize * 0.38;
  const ax0 = px(cx) - Math.cos(rad) * arrow;
  const ay0 = py(cy) + Math.sin(rad) * arrow;
  const ax1 = px(cx) + Math.cos(rad) * arrow;
  const ay1 = py(cy) - Math.sin(rad) * arrow;
  const head = 12;
  const hx1 = ax1 - head * Math.cos(rad - 0.4);
  const hy1 = ay1 + head * Math.sin(rad - 0.4);
  const hx2 = ax1 - head * Math.cos(rad + 0.4);
  const hy2 = ay1 + head * Math.sin(rad + 0.4);
  parts.push(
    `<line x1="${ax0.toFixed(2)}" y1="${ay0.toFixed(2)}" x2="${ax1.toFixed(2)}" y2="${ay1.toFixed(2)}" stroke="#b03a2e" stroke-width="2"/>`,
  );
  parts.push(
    `<polygon points="${ax1.toFixed(2)},${ay1.toFixed(2)} ${hx1.toFixed(2)},${hy1.toFixed(2)} ${hx2.toFixed(2)},${hy2.toFixed(2)}" fill="#b03a2e"/>`,
  );
  parts.push(
    `<text x="${(ax1 + 6).toFixed(2)}" y="${(ay1 - 6).toFixed(2)}" fill="#b03a2e">${escapeXml(`governing force direction ${input.directionDeg.toFixed(1)}°`)}</text>`,
  );

  // Centre of mass.
  const gx = px(input.cgPlan[0]);
  const gy = py(input.cgPlan[1]);
  parts.push(
    `<path d="M${gx - 7},${gy} H${gx + 7} M${gx},${gy - 7} V${gy + 7}" stroke="#1f4e79" stroke-width="2"/>`,
  );
  parts.push(`<text x="${gx + 9}" y="${gy + 16}" fill="#1f4e79">centre of mass</text>`);

  input.anchors.forEach((a, i) => {
    const r = 5 + (maxTension > 0 ? (9 * a.tension) / maxTension : 0);
    const governing = i === input.governingAnchor;
    parts.push(
      `<circle cx="${px(a.x).toFixed(2)}" cy="${py(a.y).toFixed(2)}" r="${r.toFixed(2)}" fill="${governing ? '#b03a2e' : '#777'}" fill-opacity="0.8"/>`,
    );
    const label = `${i + 1}: T = ${fmt(a.tension)} ${input.forceUnit}${governing ? ' (governs)' : ''}`;
    parts.push(
      `<text x="${(px(a.x) + r + 4).toFixed(2)}" y="${(py(a.y) - r - 2).toFixed(2)}">${escapeXml(label)}</text>`,
    );
  });

  const footer = top + plotSize + 56;
  caution.forEach((line, i) => {
    parts.push(`<text x="12" y="${footer + i * 14}" font-size="11" fill="#555">${escapeXml(line)}</text>`);
  });
  parts.push('</svg>');
  return `${parts.join('\n')}\n`;
}
