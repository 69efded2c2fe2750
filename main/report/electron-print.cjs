// Electron print script for `lamina projects report` (main/report/print-pdf.ts): electron-print.cjs
// REPORT.html OUT.pdf. Loads the standalone report in a hidden, sandboxed window with JavaScript
// off, prints it with the page size and margins of its CSS, writes the PDF and quits. Not run by
// the tests (no Electron binary on the build machines); the desktop app does the same in main.ts.
const { app, BrowserWindow } = require('electron');
const fs = require('node:fs');
const { pathToFileURL } = require('node:url');

const [htmlPath, pdfPath] = process.argv.slice(-2);

app.whenReady().then(async () => {
  try {
    const window = new BrowserWindow({
      show: false,
      webPreferences: { sandbox: true, contextIsolation: true, javascript: false, nodeIntegration: false },
    });
    await window.loadURL(pathToFileURL(htmlPath).href);
    const pdf = await window.webContents.printToPDF({ preferCSSPageSize: true, printBackground: true });
    fs.writeFileSync(pdfPath, pdf);
    app.exit(0);
  } catch (error) {
    process.stderr.write(`${error && error.message ? error.message : String(error)}\n`);
    app.exit(1);
  }
});
