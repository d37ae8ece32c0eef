import { Section, SectionCard } from '@blueprintjs/core';
import { LearningIcon } from '@blueprintjs/icons';

/** A short account of the formulas behind the figures, with their sources. */
export function HowComputed({ referenceText }: { referenceText?: string }) {
  return (
    <Section
      className="fw-how-computed"
      title="How this is computed"
      icon={<LearningIcon />}
      collapsible
      collapseProps={{ defaultIsOpen: false }}
      compact
    >
      <SectionCard>
        <ul className="fw-how-list">
          <li>
            <strong>Air density</strong> and <strong>dry-air density</strong>: the CIPM-2007 formula for moist air (Picard,
            Davis, Gläser and Fujii, Metrologia 45 (2008) 149), with its saturation vapour pressure, enhancement factor and
            compressibility. The dry-air density is the share of the mass that is not water vapour.
          </li>
          <li>
            <strong>Vapour pressure</strong>: relative humidity × enhancement factor × saturation vapour pressure over water
            (CIPM-2007).
          </li>
          <li>
            <strong>Station pressure from elevation</strong>: the sea-level pressure is taken as a QNH (altimeter setting) and
            brought down to the track with the standard-atmosphere pressure law (ICAO Doc 7488 / ISO 2533). The elevation is
            geometric (as on a map) and is converted to geopotential height first.
          </li>
          <li>
            <strong>Density altitude</strong>: the height in the ICAO standard atmosphere whose density equals today’s
            (geopotential metres).
          </li>
          <li>
            <strong>Relative air density</strong>: today’s density as a percentage of the reference you pick: ISA sea level
            (1.225 kg/m³), one of your logged sessions (the density worked out when it was logged), or a density you type.
            {referenceText && <> The figures above are against {referenceText}.</>}
          </li>
          <li>
            <strong>Power correction factor</strong>: SAE J1349, the JUN1990 equation for spark-ignition engines, CF = 1.18 ×
            (99 / dry-air pressure in kPa) × √((t + 273) / 298) − 0.18. Above 1 means the engine makes less power than on the
            standard day.
          </li>
        </ul>
        <p className="fw-muted fw-small">
          Outside the ranges the formulas were made for, the figures are still shown, with a note saying so.
        </p>
      </SectionCard>
    </Section>
  );
}
