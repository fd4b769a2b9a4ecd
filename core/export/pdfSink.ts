import type { jsPDF } from 'jspdf';
import { MM_PER_PT, type Stroke, type TextItem } from '../figure/scene.ts';
import type { DrawingSink } from '../figure/sink.ts';
import { safeText } from '../format/safeText.ts';

/**
 * A sink that draws onto a jsPDF document set up in mm: real path operators
 * (m/l/c/h, then S, f or B) and text in the font already selected on `pdf`.
 */
export function pdfSink(pdf: jsPDF): DrawingSink {
  let open = false;
  return {
    moveTo: (x, y) => { pdf.moveTo(x, y); open = true; },
    lineTo: (x, y) => { pdf.lineTo(x, y); },
    curveTo: (x1, y1, x2, y2, x, y) => { pdf.curveTo(x1, y1, x2, y2, x, y); },
    closePath: () => { pdf.close(); },
    paint(stroke, fill) {
      if (!open) return;
      open = false;
      if (fill) pdf.setFillColor(fill);
      if (stroke) applyStroke(pdf, stroke);
      if (stroke && fill) pdf.fillStroke();
      else if (fill) pdf.fill();
      else if (stroke) pdf.stroke();
      else pdf.discardPath();
    },
    text(item) {
      drawText(pdf, item);
    },
  };
}

function applyStroke(pdf: jsPDF, stroke: Stroke): void {
  pdf.setDrawColor(stroke.colour);
  pdf.setLineWidth(stroke.widthMm);
  pdf.setLineCap(stroke.cap ?? 'butt');
  pdf.setLineDashPattern(stroke.dashMm ?? [], 0);
}

function drawText(pdf: jsPDF, item: TextItem): void {
  pdf.setTextColor(item.colour);
  const angle = item.rotateDeg ?? 0;
  const rad = (angle * Math.PI) / 180;
  const [cos, sin] = [Math.cos(rad), Math.sin(rad)];
  for (const run of item.runs) {
    // Offsets turn with the item (SVG sense, y down); jsPDF angles are counter-clockwise.
    const x = item.x + run.dx * cos - run.dy * sin;
    const y = item.y + run.dx * sin + run.dy * cos;
    pdf.setFontSize(run.sizeMm / MM_PER_PT);
    pdf.text(safeText(run.text), x, y, angle ? { angle: -angle, baseline: 'alphabetic' } : { baseline: 'alphabetic' });
  }
}
