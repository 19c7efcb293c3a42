import type { RosterFlag } from '@peakwise/shared';
import Chip from '@mui/material/Chip';
import Tooltip from '@mui/material/Tooltip';
import { FLAG_WORDS } from '../utils/roster-words';

/** A roster flag; the tooltip (and the screen reader's description) says what it means. */
export function FlagChip({ flag }: { flag: RosterFlag }) {
  const words = FLAG_WORDS[flag];
  return (
    <Tooltip title={words.explanation} enterTouchDelay={0} leaveTouchDelay={4000}>
      <Chip
        size="small"
        label={words.label}
        color={words.color}
        variant={words.color === 'default' ? 'outlined' : 'filled'}
        // Focusable, so a keyboard can reach the tooltip too; a tap shows the tooltip rather than
        // opening the row or the entry the chip sits in.
        tabIndex={0}
        onClick={(event) => {
          event.preventDefault();
          event.stopPropagation();
        }}
        sx={{ fontWeight: 500 }}
      />
    </Tooltip>
  );
}
