import type { FillCardAnswer } from '@loftwright/contract';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { groupedFingerprint } from '../sign-off/sign-off-pdf';
import { sheetFonts } from '../sign-off/sheet-fonts';
import { GREY, MARGIN, SheetWriter } from '../sign-off/sheet-writer';

type Card = FillCardAnswer['card'];

/** File name of a card: the title's letters and digits, the version. */
export const fillCardFileName = (title: string, number: number): string =>
  `${
    title
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 80) || 'calculation'
  }-v${number}-fill-card.pdf`;

const kg = (value: number) => `${value.toFixed(3)} kg`;
const m3 = (value: number) => `${value.toFixed(value < 10 ? 4 : 2)} m³`;
const celsius = (kelvin: number) => `${(kelvin - 273.15).toFixed(1)} °C`;
const kPa = (pascal: number) => `${(pascal / 1000).toFixed(2)} kPa`;
const bar = (pascal: number) => `${(pascal / 1e5).toFixed(1)} bar`;

/**
 * The fill card as one A4 page, in the sign-off sheet's fonts and writer: the gas, the weigh-off,
 * the stop criterion, the cylinders, the cautions, and the fingerprint with the verify QR code.
 */
export async function renderFillCardPdf(answer: FillCardAnswer): Promise<Buffer> {
  const qrPng = await QRCode.toBuffer(answer.verifyUrl, {
    type: 'png',
    errorCorrectionLevel: 'M',
    margin: 2,
    scale: 6,
  });
  const fonts = sheetFonts();
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    bufferPages: true,
    info: {
      Title: `${answer.title}, version ${answer.versionNumber}: fill card`,
      Subject: `Loftwright calculation, fingerprint ${answer.fingerprint}`,
      Creator: 'Loftwright',
    },
  });
  for (const font of Object.values(fonts)) doc.registerFont(font.name, font.bytes);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const sheet = new SheetWriter(doc, fonts);
  writeHeader(sheet, answer, qrPng);
  writeGas(sheet, answer.card);
  writeWeighOff(sheet, answer.card);
  writeCylinders(sheet, answer.card);
  writeCautions(sheet, answer.card);
  writeFooter(sheet, answer);
  doc.end();
  return done;
}

function writeHeader(sheet: SheetWriter, answer: FillCardAnswer, qrPng: Buffer): void {
  const { doc, sans, bold, mono, width } = sheet;
  const qrSize = 78;
  const top = doc.y;
  doc.image(qrPng, MARGIN + width - qrSize, top, { width: qrSize, height: qrSize });
  const textWidth = width - qrSize - 12;
  sheet.write('Loftwright · fill card', sans, 9, { color: GREY, width: textWidth });
  sheet.write(answer.title, bold, 16, { width: textWidth });
  sheet.write(
    `${answer.kindTitle} · version ${answer.versionNumber} · engine ${answer.engineVersion}`,
    sans,
    9,
    { width: textWidth },
  );
  sheet.write('Content fingerprint (SHA-256)', sans, 8, { color: GREY, width: textWidth });
  sheet.write(groupedFingerprint(answer.fingerprint), mono, 8.5, { width: textWidth });
  doc.x = MARGIN;
  doc.y = Math.max(doc.y, top + qrSize + 2);
  sheet.write(answer.verifyUrl, mono, 7.5);
}

function writeGas(sheet: SheetWriter, card: Card): void {
  sheet.heading(`Gas to fill: ${card.gas.name} (${card.gas.formula})`);
  const day = card.day;
  sheet.row(
    `At the day's conditions (air ${celsius(day.airTemperature.value)}, ${kPa(day.airPressure.value)}; gas ${celsius(day.gasTemperature.value)}, ${kPa(day.gasPressure.value)})`,
    m3(card.gasVolume.value),
  );
  sheet.row(
    `At normal conditions (0 °C, 101.325 kPa; ${card.normalConditions.definition.split(':')[0]})`,
    `${m3(card.gasVolumeNormal.value)}`,
  );
  sheet.row(
    'Mass of the gas · amount',
    `${kg(card.gasMass.value)} · ${card.gasAmount.value.toFixed(1)} mol`,
  );
}

function writeWeighOff(sheet: SheetWriter, card: Card): void {
  const { doc, bold, sans } = sheet;
  sheet.heading('Weigh-off at the neck');
  sheet.row(
    `Free lift (${card.freeLift.from === 'version' ? "the version's" : 'typed on the card'})`,
    kg(card.freeLift.value),
  );
  sheet.row('Payload', kg(card.payloadMass.value));
  sheet.row('Neck lift = free lift + payload', kg(card.neckLift.value));
  sheet.row('Filler (its own mass)', kg(card.fillerMass.value));
  sheet.row('Weight to hang on the filler = neck lift − filler', kg(card.fillerWeight.value));
  doc.moveDown(0.4);
  sheet.write('Stop when', bold, 11);
  sheet.write(card.stopCriterion, sans, 10.5);
  for (const note of card.notes) sheet.write(note, sans, 8.5, { color: GREY });
}

function writeCylinders(sheet: SheetWriter, card: Card): void {
  const cylinders = card.cylinders;
  if (!cylinders) return;
  sheet.heading('Cylinders');
  sheet.row(
    'Each cylinder',
    `${(cylinders.waterVolumeM3 * 1000).toFixed(1)} L water volume, full at ${bar(cylinders.fillPressurePa)} (gauge), ${celsius(cylinders.temperatureK)}`,
    sheet.sans,
  );
  sheet.row('Cylinders opened · the team has', `${cylinders.needed} · ${cylinders.available}`);
  sheet.row(
    'Gauge pressure drop of the last cylinder opened',
    `${bar(cylinders.lastPressureDropPa)} (to ${bar(cylinders.lastEndPressurePa)})`,
  );
  sheet.write(cylinders.text, cylinders.enough ? sheet.sans : sheet.bold, 9.5);
}

function writeCautions(sheet: SheetWriter, card: Card): void {
  sheet.heading('Cautions');
  for (const caution of card.cautions) {
    sheet.write(caution.title, sheet.bold, 9.5);
    sheet.write(caution.text, sheet.sans, 8.5);
    sheet.doc.moveDown(0.2);
  }
}

/** The whole fingerprint at the foot of the page, so a torn-off card still names its version. */
function writeFooter(sheet: SheetWriter, answer: FillCardAnswer): void {
  const { doc, fonts, width } = sheet;
  const bottom = doc.page.height - MARGIN / 2 - 14;
  doc.page.margins.bottom = 0;
  doc
    .font(fonts.sans.name)
    .fontSize(8)
    .fillColor(GREY)
    .text(`${answer.title} · version ${answer.versionNumber} · fill card`, MARGIN, bottom, {
      width,
      align: 'center',
      lineBreak: false,
    });
  doc
    .font(fonts.mono.name)
    .fontSize(7)
    .text(answer.fingerprint, MARGIN, bottom + 10, { width, align: 'center', lineBreak: false });
}
