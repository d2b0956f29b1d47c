import { type FillCard, fillCardStopText, type UnitSystem } from '@loftwright/buoyancy';
import type { ReactNode } from 'react';
import { useNumberDisplay } from '@/components/reading/use-number-display';

/** What identifies the version on the printed card. */
export interface FillCardHeader {
  title: string;
  kindTitle: string;
  versionNumber: number;
  fingerprint: string;
  engineVersion: string;
  verifyUrl: string;
}

/**
 * The card as the crew takes it to the filling table: one printed page with the gas, the
 * weigh-off, the stop criterion, the cylinders and the cautions, and the version's fingerprint
 * with a QR code of its verify page. Numbers in the reader's units.
 */
export function FillCardSheet({
  card,
  header,
  unitSystem,
  qrCode,
}: {
  card: FillCard;
  header: FillCardHeader;
  unitSystem: UnitSystem;
  qrCode: ReactNode;
}) {
  const show = useNumberDisplay(unitSystem);
  const mass = (valueKg: number) => show.quantity(valueKg, 'mass').text;
  const volume = (valueM3: number) => show.quantity(valueM3, 'volume').text;
  const temperature = (valueK: number) => show.quantity(valueK, 'temperature').text;
  const pressure = (valuePa: number) => show.quantity(valuePa, 'pressure').text;
  const { day } = card;
  return (
    <article className="lw-fill-card" aria-label="Fill card">
      <header className="lw-fill-card-head">
        <div>
          <p className="lw-fill-card-product">Loftwright · fill card</p>
          <h1>{header.title}</h1>
          <p>
            {header.kindTitle} · version {header.versionNumber} · engine {header.engineVersion}
          </p>
          <p className="lw-mono lw-fill-card-fingerprint">{header.fingerprint}</p>
          <p className="lw-mono lw-fill-card-url">{header.verifyUrl}</p>
        </div>
        {qrCode}
      </header>
      <h2>
        Gas to fill: {card.gas.name} ({card.gas.formula})
      </h2>
      <table>
        <tbody>
          <Row
            label={`At the day's conditions (air ${temperature(day.airTemperature.value)}, ${pressure(day.airPressure.value)})`}
            value={volume(card.gasVolume.value)}
          />
          <Row
            label={`At normal conditions: ${card.normalConditions.definition}`}
            value={volume(card.gasVolumeNormal.value)}
          />
          <Row label="Mass of the gas" value={mass(card.gasMass.value)} />
        </tbody>
      </table>
      <h2>Weigh-off at the neck</h2>
      <table>
        <tbody>
          <Row
            label={`Free lift (${card.freeLift.from === 'version' ? "the version's" : 'typed'})`}
            value={mass(card.freeLift.value)}
          />
          <Row label="Payload" value={mass(card.payloadMass.value)} />
          <Row label="Neck lift = free lift + payload" value={mass(card.neckLift.value)} />
          <Row label="Filler (its own mass)" value={mass(card.fillerMass.value)} />
          <Row
            label="Weight to hang on the filler"
            value={
              <strong aria-label="Weight to hang on the filler">
                {mass(card.fillerWeight.value)}
              </strong>
            }
          />
        </tbody>
      </table>
      <h2>Stop when</h2>
      <p className="lw-fill-card-stop">
        {fillCardStopText({
          weight: mass(card.fillerWeight.value),
          filler: mass(card.fillerMass.value),
          neckLift: mass(card.neckLift.value),
        })}
      </p>
      {card.notes.map((note) => (
        <p key={note} className="lw-fill-card-note">
          {note}
        </p>
      ))}
      {card.cylinders ? (
        <>
          <h2>Cylinders</h2>
          <p className={card.cylinders.enough ? undefined : 'lw-fill-card-short'}>
            {card.cylinders.text}
          </p>
        </>
      ) : null}
      <h2>Cautions</h2>
      {card.cautions.map((caution) => (
        <p key={caution.code}>
          <strong>{caution.title}.</strong> {caution.text}
        </p>
      ))}
    </article>
  );
}

function Row({ label, value }: { label: string; value: ReactNode }) {
  return (
    <tr>
      <th scope="row">{label}</th>
      <td>{value}</td>
    </tr>
  );
}
