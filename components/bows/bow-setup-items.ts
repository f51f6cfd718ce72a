import { formatDrawLength, formatLength } from '@/components/forms/form-numbers';
import type { KeyValueItem } from '@/components/bows/key-value-list';
import type { LengthUnit } from '@/shared/auth';
import type { Bow, SightKind } from '@/shared/bow';
import { formatQuantity, type UnitsLike } from '@/shared/units';

/** Plain names of the sight kinds. */
export const sightKindNames: Record<SightKind, string> = {
  'single-pin-slider': 'Single-pin slider',
  'fixed-multi-pin': 'Fixed multi-pin',
  hybrid: 'Hybrid (fixed pins on a slider)',
};

/**
 * A bow's set-up as label / value rows, lengths in the archer's unit.
 * Example: bowSetupItems(bow, 'mm')[0] → { label: 'Hand', value: 'Right' }
 */
export function bowSetupItems(bow: Bow, unit: LengthUnit, units?: UnitsLike): KeyValueItem[] {
  const items: KeyValueItem[] = [
    { label: 'Hand', value: bow.hand === 'right' ? 'Right' : 'Left' },
    { label: 'Draw weight', value: `${bow.drawWeightLb} lb`, numeric: true },
    { label: 'Draw length', value: formatDrawLength(bow.drawLengthMm, unit), numeric: true },
  ];
  if (bow.letOffPct !== null) items.push({ label: 'Let-off', value: `${bow.letOffPct} %`, numeric: true });
  if (bow.ratedSpeedFps !== null)
    items.push({ label: 'Rated speed', value: formatQuantity(bow.ratedSpeedFps, 'speed', units), numeric: true });
  items.push(
    { label: 'Sight', value: [sightKindNames[bow.sightKind], bow.sightDescription].filter(Boolean).join(' · ') },
    { label: 'Sight radius', value: formatLength(bow.sightRadiusMm, unit), numeric: true },
    { label: 'Peep height', value: formatLength(bow.peepHeightMm, unit), numeric: true },
    { label: 'Scale readings', value: bow.scaleDirection === 'down' ? 'Grow as the pin moves down' : 'Grow as the pin moves up' },
    { label: 'Tape width', value: formatLength(bow.tapeWidthMm, unit, 1), numeric: true },
  );
  if (bow.sightKind !== 'single-pin-slider' && bow.pinDistances.length > 0) {
    items.push({ label: 'Pins', value: `${bow.pinDistances.join(', ')} ${bow.pinDistanceUnit}`, numeric: true });
  }
  if (bow.notes) items.push({ label: 'Notes', value: bow.notes });
  return items;
}
