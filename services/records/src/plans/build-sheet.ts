import fs from 'node:fs';
import PDFDocument from 'pdfkit';
import type { RackPlanRequest, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { formatLength, formatMillimetres, toInches } from '../../../../shared/units.js';

export interface BuildSheetPlan {
  id: number;
  name: string;
  version: number;
  notes: string;
  tubModelName: string | null;
  spec: RackPlanRequest;
  result: RackPlanResponse;
}

export interface BuildSheetOptions {
  date?: Date;
  /** Uncompressed content streams, so tests can read the text. */
  compress?: boolean;
  /** Folder with DejaVuSans.ttf and DejaVuSans-Bold.ttf; null forces the built-in Helvetica. */
  fontDir?: string | null;
}

/** Debian's fonts-dejavu-core; the built-in Helvetica is not embedded and lacks many glyphs. */
const DEJAVU_DIR = '/usr/share/fonts/truetype/dejavu';

const MARGIN = 48;
const GREY = '#555555';
const RULE = '#bbbbbb';

interface Column {
  title: string;
  /** Share of the content width. */
  width: number;
  align?: 'left' | 'right';
}

/**
 * The printable build sheet of a plan: dimensions, sections, parts, hardware, heat and electrical
 * figures, an assembly order, the checks and the safety cautions. Resolves to the PDF bytes.
 */
export function buildSheetPdf(plan: BuildSheetPlan, options: BuildSheetOptions = {}): Promise<Buffer> {
  const { result, spec } = plan;
  const date = options.date ?? new Date();
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: MARGIN,
    compress: options.compress ?? true,
    bufferPages: true,
    info: { Title: `Build sheet: ${plan.name}`, Subject: 'Rack build sheet', Creator: 'Tubwright' },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const fontDir = options.fontDir === undefined ? DEJAVU_DIR : options.fontDir;
  const regular = fontDir && `${fontDir}/DejaVuSans.ttf`;
  const bold = fontDir && `${fontDir}/DejaVuSans-Bold.ttf`;
  doc.registerFont('body', regular && fs.existsSync(regular) ? regular : 'Helvetica');
  doc.registerFont('bold', bold && fs.existsSync(bold) ? bold : regular && fs.existsSync(regular) ? regular : 'Helvetica-Bold');

  const unit = result.unit;
  const len = (value: number) => formatLength(toInches(value, unit), unit);
  const bare = (value: number) => (unit === 'in' ? len(value).replace(/ in$/, '') : formatMillimetres(value));
  const width = doc.page.width - 2 * MARGIN;
  const bottom = () => doc.page.height - MARGIN - 20;

  const ensure = (height: number) => {
    if (doc.y + height > bottom()) doc.addPage();
  };
  const heading = (text: string) => {
    ensure(60);
    doc.moveDown(0.6).font('bold').fontSize(12.5).fillColor('black').text(text, MARGIN, doc.y, { width });
    doc.moveDown(0.25);
  };
  const para = (text: string, opts: { size?: number; color?: string; indent?: number } = {}) => {
    doc.font('body').fontSize(opts.size ?? 9.5).fillColor(opts.color ?? 'black');
    ensure(doc.heightOfString(text, { width: width - (opts.indent ?? 0) }));
    doc.text(text, MARGIN + (opts.indent ?? 0), doc.y, { width: width - (opts.indent ?? 0) });
  };
  const list = (items: string[], numbered: boolean) => {
    items.forEach((item, i) => {
      const marker = numbered ? `${i + 1}.` : '•';
      doc.font('body').fontSize(9.5).fillColor('black');
      const h = doc.heightOfString(item, { width: width - 18 });
      ensure(h + 3);
      const y = doc.y;
      doc.text(marker, MARGIN, y, { width: 16 });
      doc.text(item, MARGIN + 18, y, { width: width - 18 });
      doc.y = Math.max(doc.y, y + h) + 3;
    });
  };

  const table = (columns: Column[], rows: string[][], size = 8.5) => {
    const xs: number[] = [];
    let x = MARGIN;
    for (const c of columns) {
      xs.push(x);
      x += c.width * width;
    }
    const pad = 3;
    const rowHeight = (cells: string[], font: string) => {
      doc.font(font).fontSize(size);
      return Math.max(...cells.map((cell, i) => doc.heightOfString(cell, { width: columns[i]!.width * width - 2 * pad }))) + 2 * pad;
    };
    const drawRow = (cells: string[], font: string, shade: boolean) => {
      const h = rowHeight(cells, font);
      const y = doc.y;
      if (shade) doc.rect(MARGIN, y, width, h).fill('#eeeeee');
      doc.font(font).fontSize(size).fillColor('black');
      cells.forEach((cell, i) => {
        const c = columns[i]!;
        doc.text(cell, xs[i]! + pad, y + pad, { width: c.width * width - 2 * pad, align: c.align ?? 'left' });
      });
      doc.moveTo(MARGIN, y + h).lineTo(MARGIN + width, y + h).lineWidth(0.5).strokeColor(RULE).stroke();
      doc.x = MARGIN;
      doc.y = y + h;
    };
    const header = columns.map((c) => c.title);
    ensure(rowHeight(header, 'bold') + rowHeight(rows[0] ?? header, 'body'));
    drawRow(header, 'bold', true);
    for (const row of rows) {
      if (doc.y + rowHeight(row, 'body') > bottom()) {
        doc.addPage();
        drawRow(header, 'bold', true);
      }
      drawRow(row, 'body', false);
    }
    doc.moveDown(0.3);
  };

  // Title block
  doc.font('bold').fontSize(18).fillColor('black').text('Build sheet', MARGIN, MARGIN, { width });
  doc.font('bold').fontSize(13).text(plan.name, { width });
  para(
    [
      `Plan ${plan.id}, version ${plan.version}`,
      `printed ${date.toISOString().slice(0, 10)}`,
      plan.tubModelName ? `tub: ${plan.tubModelName}` : null,
      `${spec.layout.levels} levels x ${spec.layout.columns} columns`,
      `lengths in ${unit === 'in' ? 'inches (to 1/16)' : 'millimetres'}`,
    ]
      .filter(Boolean)
      .join(' · '),
    { color: GREY },
  );
  para(`Tub as measured: ${len(spec.tub.length)} long x ${len(spec.tub.width)} wide x ${len(spec.tub.height)} high (rim included).`, { color: GREY });
  if (plan.notes) para(`Notes: ${plan.notes}`, { color: GREY });

  heading('Key dimensions');
  const d = result.dimensions;
  table(
    [
      { title: 'Dimension', width: 0.55 },
      { title: 'Value', width: 0.45 },
    ],
    [
      ['Overall height (with base and casters)', len(d.overallHeight)],
      ['Overall width', len(d.overallWidth)],
      ['Overall depth', len(d.overallDepth)],
      ['Level opening (tub height + lid gap)', len(d.levelOpening)],
      ['Interior shelf length', len(d.interiorShelfLength)],
      ['Top and bottom panel length', len(d.outerShelfLength)],
      ['Panel depth', len(d.depth)],
      ['Carcass height', len(d.carcassHeight)],
      ['Base height (2x4 on edge + casters)', len(d.baseHeight)],
    ],
  );

  heading('Sections (from the bottom)');
  table(
    [
      { title: 'Section', width: 0.12 },
      { title: 'Levels', width: 0.16 },
      { title: 'Side panel height', width: 0.22 },
      { title: 'Section height', width: 0.2 },
      { title: 'Bottom panel', width: 0.14 },
      { title: 'Dowels below', width: 0.16 },
    ],
    result.sections.map((s) => [
      String(s.index),
      `${s.levels} (levels ${s.firstLevel}–${s.firstLevel + s.levels - 1})`,
      len(s.sidePanelHeight),
      len(s.height),
      s.hasBottomPanel ? 'yes' : 'no',
      String(s.dowels),
    ]),
  );

  heading('Parts (cut list)');
  table(
    [
      { title: 'No.', width: 0.06, align: 'right' },
      { title: 'Part', width: 0.25 },
      { title: 'Material', width: 0.18 },
      { title: `Thick. (${unit})`, width: 0.1, align: 'right' },
      { title: `Length (${unit})`, width: 0.13, align: 'right' },
      { title: `Width (${unit})`, width: 0.13, align: 'right' },
      { title: 'Qty', width: 0.06, align: 'right' },
      { title: 'Section', width: 0.09 },
    ],
    result.parts.map((p, i) => [String(i + 1), p.note ? `${p.name}\n${p.note}` : p.name, p.material, bare(p.thickness), bare(p.length), bare(p.width), String(p.quantity), p.section === null ? 'base' : String(p.section)]),
  );
  if (result.cost.sheets.length > 0) {
    para('Sheets to buy:', { size: 9.5 });
    list(
      result.cost.sheets.map((s) => `${s.count} x ${s.material}, ${len(s.thickness)} thick (${s.method === 'nested' ? 'from the cutting plan' : 'area estimate'})`),
      false,
    );
  }

  heading('Hardware');
  table(
    [
      { title: 'Item', width: 0.32 },
      { title: 'Qty', width: 0.08, align: 'right' },
      { title: 'Unit', width: 0.08 },
      { title: 'Basis and note', width: 0.52 },
    ],
    result.hardware.filter((h) => h.quantity > 0).map((h) => [h.name, String(h.quantity), h.unit, h.note ? `${h.basis}; ${h.note}` : h.basis]),
  );

  const heat = result.heat;
  heading('Heat and electrical');
  if (heat.enabled) {
    const c15 = heat.circuits.find((c) => c.ratingA === 15);
    const c20 = heat.circuits.find((c) => c.ratingA === 20);
    const pct = (share: number) => `${Math.round(share * 100)} %`;
    list(
      [
        `${heat.strips} strips of heat tape, one per level, each ${len(heat.stripLength)} long: ${heat.stripPowerW} W per strip at ${heat.wattsPerFoot} W/ft.`,
        `Total ${heat.totalTapeFeet} ft of tape, ${heat.totalPowerW} W, ${heat.currentA} A at ${heat.supplyVoltageV} V.`,
        `${heat.thermostats} thermostat(s), at most ${heat.stripsPerThermostat} strips each (rating ${heat.thermostatRatingW} W).`,
        ...(c15 && c20 ? [`Share of a branch circuit's 80 % continuous limit: ${pct(c15.share)} of 15 A, ${pct(c20.share)} of 20 A, before anything else on the circuit.`] : []),
      ],
      false,
    );
  } else {
    para('No heat tape is planned for this rack.');
  }

  heading('Assembly order');
  list(assemblySteps(plan, len), true);

  heading('Checks');
  if (result.checks.length === 0) para('No checks were reported.');
  for (const check of result.checks) {
    para(`${check.severity.toUpperCase()}: ${check.message}`);
    para(`Basis: ${check.basis}`, { size: 8, color: GREY, indent: 12 });
    doc.moveDown(0.2);
  }

  heading('Safety cautions');
  list(safetyCautions(plan, len), false);

  // Footer on every page, written last so the page count is known.
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Writing below the bottom margin would otherwise start a new page.
    doc.page.margins.bottom = 0;
    doc.font('body').fontSize(8).fillColor(GREY);
    doc.text(`${plan.name} · version ${plan.version} · page ${i + 1} of ${range.count}`, MARGIN, doc.page.height - MARGIN, { width, align: 'center', lineBreak: false });
  }
  doc.end();
  return done;
}

/** The order the shop builds in, with this plan's numbers. */
export function assemblySteps(plan: BuildSheetPlan, len: (value: number) => string): string[] {
  const { result } = plan;
  const hw = (key: string) => result.hardware.filter((h) => h.key === key).reduce((n, h) => n + h.quantity, 0);
  const has = (key: string) => result.parts.some((p) => p.key === key);
  const casters = hw('caster') + hw('caster.locking');
  const steps: string[] = [];
  steps.push(
    `Base: cut the 2x4 rails, cross members and centre brace; screw the frame together on edge (${hw('screw.base')} screws) and check it is square by comparing the diagonals. Fit ${casters} casters (${hw('caster.locking')} with brakes) with ${hw('screw.caster')} screws.`,
  );
  const [lowest, ...upper] = result.sections;
  if (lowest) {
    steps.push(
      `Bottom section (section 1, ${lowest.levels} levels): screw the side panels to the bottom panel through countersunk pilot holes, fit the interior shelves between the side panels ${len(result.dimensions.levelOpening)} apart (clear opening), then the top panel. Set it on the base, flush at the back and the sides.`,
    );
  }
  for (const s of upper) {
    steps.push(
      `Section ${s.index} (${s.levels} levels): assemble like the bottom section but without a bottom panel; stand it on the top panel of the section below, located with ${s.dowels} dowels drilled through that top panel into its side panels.`,
    );
  }
  if (has('divider')) steps.push('Dividers: fit them between the shelves and screw through the shelves into their ends.');
  if (has('support-block-front') || has('support-block-back')) {
    steps.push(
      `Support blocks: glue a pair per level at each support column (${result.loads.supportColumns}): the wide block flush with the front edge, the thin one just in front of the heat tape, both standing between the shelves.`,
    );
  }
  if (has('back-panel')) steps.push('Back panels: fix them to the back of each section once the section is square.');
  if (result.heat.enabled) {
    steps.push(
      `Heat tape: lay one strip of ${len(result.heat.stripLength)} along the back of every level, on the panel each tub stands on, stopping short of both ends by the same margin; route the leads to the back.`,
    );
    steps.push(
      `Thermostat: connect the strips to ${result.heat.thermostats} thermostat(s), no more than ${result.heat.stripsPerThermostat} strips (${result.heat.thermostatRatingW} W) on one, with the probe placed as the thermostat's maker instructs. Test every strip before loading tubs.`,
    );
  }
  steps.push('Last: lock the casters, slide every tub in and check that it runs freely and that the lid gap is even on every level.');
  return steps;
}

/** Always printed, whatever the checks say. */
export function safetyCautions(plan: BuildSheetPlan, len: (value: number) => string): string[] {
  const { result, spec } = plan;
  const tipping = result.checks.some((c) => c.code === 'tipping');
  const escape = spec.limits.escapeGap !== undefined ? len(spec.limits.escapeGap) : '1/4 in (the default threshold)';
  const cautions = [
    `Heat tape and thermostats: use tape and thermostats rated for the load; no thermostat may switch more than its maker's rating (planned: ${result.heat.stripsPerThermostat} strips of ${result.heat.stripPowerW} W on a ${result.heat.thermostatRatingW} W thermostat).`,
    'Electrical work: follow local electrical code, and have the wiring done or checked by a licensed electrician where the code requires it. Keep the heat load within the circuit it is plugged into.',
    `Anchoring: ${tipping ? 'this rack is tall for its depth; ' : ''}anchor tall racks to the wall and lock the casters before loading tubs (height to depth ${result.loads.heightToDepth}).`,
    `Escape gaps: check the lid gap of every level with the tubs loaded; a gap wider than ${escape} may let a small animal out, and a gap at or below zero makes the tub bind.`,
    ...result.heat.cautions,
  ];
  return [...new Set(cautions)];
}
