using Helipol.Model;
namespace Helipol.Geometry;

/// <summary>
/// The sense letter (R for RHCP, L for LHCP) sunk into the wall between the first two grooves,
/// drawn on a lattice of points in the sheared (groove-following) coordinates, so it leans with
/// the elements. Each lattice point is either sunk by <see cref="FormerSleeve.MarkDepthMm"/> or
/// not; the surface between points is interpolated.
/// </summary>
public sealed record SenseMark(char Letter, double CentreShearedAzimuthRad, double CentreHeightMm, double PitchRad, double PitchMm, IReadOnlyList<string> Rows)
{
    /// <summary>5 × 7 point glyphs, top row first; '#' = sunk.</summary>
    public static IReadOnlyList<string> Glyph(char letter) => letter switch
    {
        'R' => ["####.", "#...#", "#...#", "####.", "#.#..", "#..#.", "#...#"],
        'L' => ["#....", "#....", "#....", "#....", "#....", "#....", "#####"],
        _ => throw new ArgumentOutOfRangeException(nameof(letter)),
    };

    public static SenseMark Place(Sense sense, double lowerMm, double upperMm, double groovePitchRad, double grooveHalfRad, double radiusMm)
    {
        var letter = sense == Sense.Rhcp ? 'R' : 'L';
        // Lattice of 7 × 9 points including an unsunk border; fits 80 % of the element's rise and
        // 80 % of the land between two grooves, and is at most 0.6 mm per step.
        var land = groovePitchRad - 2 * grooveHalfRad;
        var pitchMm = Math.Min(0.6, Math.Min(0.8 * (upperMm - lowerMm) / 8, 0.8 * land * radiusMm / 6));
        return new SenseMark(letter, groovePitchRad / 2, (lowerMm + upperMm) / 2, pitchMm / radiusMm, pitchMm, Glyph(letter));
    }

    /// <summary>Sheared azimuths of the lattice columns (border included), left to right.</summary>
    public IEnumerable<double> ColumnsRad => Enumerable.Range(-3, 7).Select(c => CentreShearedAzimuthRad + c * PitchRad);
    /// <summary>Heights of the lattice rows (border included), bottom to top.</summary>
    public IEnumerable<double> RowsMm => Enumerable.Range(-4, 9).Select(r => CentreHeightMm + r * PitchMm);
    public int SunkPointCount => Rows.Sum(r => r.Count(ch => ch == '#'));

    /// <summary>Sunk fraction at (sheared azimuth, height): bilinear between lattice points.</summary>
    public double Fraction(double shearedRad, double zMm)
    {
        var u = (shearedRad - CentreShearedAzimuthRad) / PitchRad + 2;  // glyph column, 0..4
        var v = (CentreHeightMm - zMm) / PitchMm + 3;                     // glyph row from the top, 0..6
        if (u <= -1 || u >= 5 || v <= -1 || v >= 7) return 0;
        var c0 = (int)Math.Floor(u);
        var r0 = (int)Math.Floor(v);
        var fu = u - c0;
        var fv = v - r0;
        return At(r0, c0) * (1 - fu) * (1 - fv) + At(r0, c0 + 1) * fu * (1 - fv)
             + At(r0 + 1, c0) * (1 - fu) * fv + At(r0 + 1, c0 + 1) * fu * fv;
    }

    private double At(int row, int col) =>
        row >= 0 && row < 7 && col >= 0 && col < 5 && Rows[row][col] == '#' ? 1 : 0;
}
