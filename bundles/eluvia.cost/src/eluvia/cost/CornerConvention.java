package eluvia.cost;

/**
 * How the sloped sides of a pit meet at the corners of its footprint.
 *
 * <p>Going up a pit of side slope m, every side moves outward by m z at height z above the
 * bottom. The plan area there is A(z) = A + P (m z) + K (m z)^2 for a convex footprint of area A
 * and perimeter P; only the corner coefficient K depends on the corners:
 * <ul>
 * <li>{@link #MITRED}: each side is a plane and neighbouring planes meet in a sharp edge (how a
 * rectangular pit is usually drawn). For a convex polygon K is the sum over the corners of
 * tan(phi/2), phi the exterior (turning) angle there: 4 for a rectangle, which gives the rectangle
 * formula V = h [L W + m h (L + W) + (4/3) m^2 h^2].</li>
 * <li>{@link #ROUNDED}: the corners are rounded to radius m z, i.e. the outline at height z is the
 * outward offset of the bottom outline (Steiner's formula for convex sets). K = pi for any convex
 * footprint, which gives V = A h + P m h^2 / 2 + pi m^2 h^3 / 3.</li>
 * </ul>
 * Since tan(phi/2) is at least phi/2 and the angles add up to 2 pi, K is at least pi: the rounded
 * convention gives the smallest pit, mitred corners a larger one (for a rectangle by
 * (4 - pi) m^2 h^3 / 3). Both are exact for their own geometry; the prismoidal formula
 * h/6 (A1 + 4 Am + A2) is exact for both because A(z) is quadratic in z.
 */
public enum CornerConvention {
    /** Sharp corners where the side planes meet; K = sum of tan(half exterior angle), 4 for a rectangle. */
    MITRED,
    /** Corners rounded at radius m z (outward offset of the outline); K = pi. */
    ROUNDED
}
