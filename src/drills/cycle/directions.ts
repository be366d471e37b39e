// The ways a Window Cycle plays its keys, as the setup form and the plan editor offer them.
import type { CycleSettings } from '../../contract/drills'

export const DIRECTION_OPTIONS: { title: string; value: CycleSettings['direction'] }[] = [
  { title: 'Alternate: up, down, up …', value: 'alternate' },
  { title: 'Up: root to the root above', value: 'up' },
  { title: 'Down: root to the root below', value: 'down' },
]
