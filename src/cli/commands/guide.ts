/**
 * `kerfline guide <circuit> <layout> --out guide.html [--pdf guide.pdf] [--paper a4|letter]`
 *
 * Verifies the layout against the circuit (JSON document or SPICE deck, see ../io.ts) and
 * writes the bench guide as one self-contained HTML file (default paper A4). `--pdf` also
 * prints it to PDF through Chromium (playwright-core, executable from PLAYWRIGHT_CHROMIUM,
 * default /usr/bin/chromium; the CSS page size wins). Exit 0 when written; 1 when the
 * layout does not verify, when no guide could be made, or when --pdf was asked but
 * Chromium is not installed or cannot print; 2 for unreadable input, an output file that
 * cannot be written, or a usage error.
 */
import { existsSync } from 'node:fs';
import { buildGuide, guideHtml, guidePages, type Paper } from '../../lib/guide/index.ts';
import { readArgs } from '../args.ts';
import { loadCircuit, loadLayout, printProblems, writeTextFile } from '../io.ts';

const USAGE = 'usage: kerfline guide <circuit> <layout> --out guide.html [--pdf guide.pdf] [--paper a4|letter]\n';

interface Args {
  circuit?: string;
  layout?: string;
  out?: string;
  pdf?: string;
  paper: Paper;
  error?: string;
}

function parseArgs(args: string[]): Args {
  const r = readArgs(args, { options: ['--out', '--pdf', '--paper'] });
  const out: Args = { paper: 'a4' };
  const html = r.options.get('--out');
  if (html !== undefined) out.out = html;
  const pdf = r.options.get('--pdf');
  if (pdf !== undefined) out.pdf = pdf;
  const paper = r.options.get('--paper')?.toLowerCase();
  if (paper === 'a4' || paper === 'letter') out.paper = paper;
  else if (paper !== undefined) out.error = `--paper is a4 or letter, not "${paper}"`;
  if (r.error) out.error ??= r.error;
  if (r.files.length !== 2) out.error ??= 'name the circuit file and then the layout file';
  else [out.circuit, out.layout] = r.files;
  if (!out.out && !out.error) out.error = 'say where to write the guide: --out guide.html';
  return out;
}

/** Where playwright-core finds Chromium. */
export function chromiumPath(): string {
  return process.env.PLAYWRIGHT_CHROMIUM || '/usr/bin/chromium';
}

/** Print an HTML document to PDF bytes in headless Chromium, using the document's @page size. */
export async function htmlToPdf(html: string): Promise<Uint8Array> {
  const { chromium } = await import('playwright-core');
  const browser = await chromium.launch({
    executablePath: chromiumPath(),
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update'],
  });
  try {
    const page = await browser.newPage();
    await page.setContent(html, { waitUntil: 'load' });
    return new Uint8Array(await page.pdf({ preferCSSPageSize: true, printBackground: true }));
  } finally {
    await browser.close();
  }
}

export async function run(args: string[]): Promise<number> {
  const a = parseArgs(args);
  if (a.error) {
    process.stderr.write(`kerfline guide: ${a.error}\n${USAGE}`);
    return 2;
  }
  const circuit = await loadCircuit(a.circuit!);
  if (!circuit.ok) {
    printProblems([...circuit.problems, ...circuit.warnings], process.stderr, a.circuit);
    return 2;
  }
  const layout = await loadLayout(a.layout!);
  if (!layout.ok) {
    printProblems([...layout.problems, ...layout.warnings], process.stderr, a.layout);
    return 2;
  }
  const guide = buildGuide(circuit.value.circuit, layout.value);
  if (!guide.ok) {
    printProblems(guide.problems, process.stderr, a.layout);
    return 1;
  }
  if (guide.warnings.length) printProblems(guide.warnings, process.stderr, a.layout);
  const html = guideHtml(guide.value, { paper: a.paper });
  const written = await writeTextFile(a.out!, html);
  if (!written.ok) {
    printProblems(written.problems, process.stderr);
    return 2;
  }
  const pages = guidePages(guide.value, { paper: a.paper }).length;
  process.stdout.write(`wrote ${a.out} (${pages} pages, ${a.paper})\n`);
  if (a.pdf) {
    if (!existsSync(chromiumPath())) {
      process.stderr.write(
        `kerfline guide: --pdf needs Chromium, not found at ${chromiumPath()}.\nInstall it (Debian: sudo apt-get install -y chromium) or set PLAYWRIGHT_CHROMIUM; the HTML guide above prints from any browser.\n`,
      );
      return 1;
    }
    let pdf: Uint8Array;
    try {
      pdf = await htmlToPdf(html);
    } catch (e) {
      // Chromium that will not start or print is the machine, not the input: say so in one line.
      process.stderr.write(`kerfline guide: Chromium at ${chromiumPath()} could not print the PDF (${(e instanceof Error ? e.message : String(e)).split('\n')[0]}); the HTML guide above prints from any browser.\n`);
      return 1;
    }
    const pdfWritten = await writeTextFile(a.pdf, pdf);
    if (!pdfWritten.ok) {
      printProblems(pdfWritten.problems, process.stderr);
      return 2;
    }
    process.stdout.write(`wrote ${a.pdf}\n`);
  }
  return 0;
}
