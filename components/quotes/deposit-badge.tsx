import { formatMinor } from '../../shared/payments/deposit-amount';
import { DEPOSIT_STATUS_LABELS, type DepositStatus, type DepositView } from '../../shared/schemas/deposits';
import { Tag, type TagTone } from '../ui/tag';

const TONES: Record<DepositStatus, TagTone> = { due: 'warning', pending: 'primary', failed: 'danger', paid: 'success', refunded: 'neutral' };

/** "Deposit paid · €472.65" beside a quote. */
export function DepositBadge({ deposit }: { deposit: DepositView }) {
  return <Tag tone={TONES[deposit.status]} label={`${DEPOSIT_STATUS_LABELS[deposit.status]} · ${formatMinor(deposit.amountMinor, deposit.currency)}`} />;
}
