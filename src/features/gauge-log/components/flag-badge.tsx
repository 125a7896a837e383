import { gaugeFlagLabels, type GaugeFlag } from '../../../../shared/schemas/gauge-log';
import { StatusBadge } from '../../../components/ui/status-badge';

/** Quiet / Close / Over as a word with colour and shape (never colour alone). */
export function FlagBadge({ flag }: { flag: GaugeFlag }) {
  return <StatusBadge tone={flag}>{gaugeFlagLabels[flag]}</StatusBadge>;
}
