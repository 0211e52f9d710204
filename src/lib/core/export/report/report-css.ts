/** Print-first styles of the design report: A4 or US Letter pages, tables that break cleanly. */
export const REPORT_CSS = `
body { font: 10.5pt/1.4 system-ui, 'DejaVu Sans', sans-serif; color: #1b1b1b; margin: 0 auto; max-width: 190mm; padding: 8mm; }
h1 { font-size: 17pt; margin: 0 0 2mm; }
h2 { font-size: 12.5pt; margin: 6mm 0 2mm; border-bottom: 1px solid #bbb; padding-bottom: 1mm; }
.meta { color: #555; margin: 0; }
.verdict { font-weight: 600; margin: 2mm 0; }
.verdict.fail, b.fail { color: #b3261e; }
.verdict.warn, b.warn { color: #8a6a10; }
.verdict.pass, b.pass { color: #2e6b2e; }
table { border-collapse: collapse; margin: 2mm 0; font-size: 9.5pt; }
th, td { border: 1px solid #ccc; padding: 1mm 2mm; text-align: left; vertical-align: top; }
th { background: #f2f2f2; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; }
table.findings { width: 100%; table-layout: fixed; }
table.findings th:nth-child(1) { width: 9%; }
table.findings th:nth-child(2) { width: 45%; }
table.findings th:nth-child(3) { width: 25%; }
table.findings td { overflow-wrap: break-word; }
table.findings code { font-weight: 600; }
code { font-size: 7.5pt; white-space: nowrap; }
.cols { display: flex; gap: 6mm; flex-wrap: wrap; align-items: flex-start; }
@media print { body { max-width: none; padding: 0; } .cols { display: block; } .cols > table { display: inline-table; margin-right: 6mm; } }
figure.drawing { margin: 0; }
figure.drawing > svg { display: block; max-width: 100%; height: auto; }
@media print { figure.drawing > svg { max-width: none; height: revert; } }
figcaption { display: flex; gap: 4mm; align-items: center; font-size: 9pt; color: #444; margin-top: 2mm; flex-wrap: wrap; }
.key, .swatch { display: inline-flex; align-items: center; gap: 1.5mm; margin-right: 3mm; }
.key i, .swatch i { display: inline-block; width: 4mm; height: 4mm; border: 1px solid #999; }
.swatch i { width: 8mm; height: 6mm; }
.caution { border-left: 3px solid #b3261e; padding-left: 3mm; }
section { break-inside: auto; }
h2, tr, figure { break-inside: avoid; }
h2 { break-after: avoid; }
svg.plot { max-width: 100%; height: auto; }
`;
