import { sheetStateLabels, type SheetState } from '../../../../shared/schemas/sheets';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const tones: Record<SheetState, StatusTone> = {
  draft: 'neutral',
  'awaiting-review': 'close',
  returned: 'over',
  signed: 'quiet',
  superseded: 'neutral',
};

/** A sheet's state as a word with a colour and a shape. */
export function SheetStateBadge({ state }: { state: SheetState }) {
  return <StatusBadge tone={tones[state]}>{sheetStateLabels[state]}</StatusBadge>;
}
