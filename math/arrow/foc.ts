/**
 * Front-of-centre balance, per cent (common practice, no published source):
 *   FOC = 100 × (B − L/2)/L
 * B is the balance point measured from the nock throat, L the arrow's length
 * from the nock throat to the end of the shaft; both in one length unit.
 * Example: focPercent({ balancePoint: 16.5, arrowLength: 28.5 }) → 7.89
 */
export function focPercent(arrow: { balancePoint: number; arrowLength: number }): number {
  if (!(arrow.arrowLength > 0) || !(arrow.balancePoint >= 0) || arrow.balancePoint > arrow.arrowLength) {
    throw new RangeError('focPercent: the balance point must lie on an arrow of positive length');
  }
  return (100 * (arrow.balancePoint - arrow.arrowLength / 2)) / arrow.arrowLength;
}
