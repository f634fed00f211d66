using Helipol.Engine;

namespace Helipol.Tests.Engine;

public class DipoleTests
{
    private static double Resistance(double length, double radius, double density = 20) =>
        Antennas.Solve(Antennas.Dipole(length, radius), options: new SegmentationOptions(density)).InputImpedanceOhm().Real;

    // Balanis, Antenna Theory, 3rd ed., §4.6, eqs. 4-91 and 4-93: a half-wave dipole with a sinusoidal
    // current on a vanishing radius has R = 73.08 Ω and D = 1.641. A finite radius reads higher, and the
    // excess shrinks as the wire thins (King's tables show R falling towards 73 Ω as Ω = 2 ln(2h/a) grows).
    // We check the trend is monotone, bounded below by 73.08 Ω, and within 10 % at a = 1e-6 λ.
    [Fact]
    public void HalfWaveResistanceFallsTowards73OhmAsTheWireThins()
    {
        double[] radii = { 1e-3, 1e-4, 1e-5, 1e-6 };
        var r = radii.Select(a => Resistance(0.5, a, 40)).ToArray();
        for (int i = 1; i < r.Length; i++) Assert.True(r[i] < r[i - 1], $"R = {string.Join(", ", r)} should fall as the wire thins");
        Assert.All(r, x => Assert.True(x > 73.08, $"R = {x} Ω below the vanishing-radius limit"));
        Assert.InRange(r[^1], 73.08, 73.08 * 1.10);
    }

    // Balanis §4.6 eq. 4-91: D = 1.641 broadside for the ideal half-wave dipole. The current shape of a
    // thin finite wire is close to sinusoidal, so D agrees to well under 1 %.
    [Fact]
    public void HalfWaveDirectivityIs1_641()
    {
        var s = Antennas.Solve(Antennas.Dipole(0.5, 1e-5), options: new SegmentationOptions(40));
        Assert.Equal(1.641, s.DirectivityAt(Math.PI / 2, 0), 0.01);
        Assert.Equal(1.641, s.DirectivityAt(Math.PI / 2, 1.3), 0.01); // omnidirectional in azimuth
        Assert.True(s.DirectivityAt(0, 0) < 1e-6, "no radiation along the wire axis");
    }

    // Balanis, Antenna Theory, 4th ed., §9.5: 85.8 + j54.9 Ω for a λ/2 dipole of radius 0.005 λ (value as
    // transcribed, not re-checked against the book). That
    // figure comes from an approximate current and a different feed model; input reactance of a thick
    // dipole depends strongly on the feed-gap model (tens of ohms between models), resistance much less.
    // We check R within 10 % and that X is inductive and within 25 Ω. The book's wire is an open tube
    // (current zero at the end, no cap), so the engine's wire is too.
    [Fact]
    public void HalfWaveAtRadiusFiveThousandthsWavelengthMatchesBalanis()
    {
        var z = Antennas.Solve(Antennas.Dipole(0.5, 0.005, ends: WireEnds.Open)).InputImpedanceOhm();
        Assert.InRange(z.Real, 85.8 * 0.90, 85.8 * 1.10);
        Assert.InRange(z.Imaginary, 54.9 - 25, 54.9 + 25);
    }

    // King, Tables of Antenna Characteristics (1971), a/λ = 0.00635 (values as transcribed, not
    // re-checked against the book). These are thick wires (length ≈ 75 radii) where the reduced thin-wire kernel is at the
    // edge of its validity and King's feed model differs from a delta gap: we allow 8 % in R and 6 Ω in X.
    // King's tubes carry no charge on their ends (current zero at the open end), so neither does the
    // engine's wire here: with flat caps the dipole is electrically a radius longer and R reads 8-13 % high.
    [Theory]
    [InlineData(0.4456, 58.86, -24.77)]
    [InlineData(0.4775, 75.35, 8.68)]
    [InlineData(0.5093, 96.47, 43.82)]
    public void ThickDipoleMatchesKingsTables(double length, double r, double x)
    {
        var z = Antennas.Solve(Antennas.Dipole(length, 0.00635, ends: WireEnds.Open)).InputImpedanceOhm();
        Assert.InRange(z.Real, r * 0.92, r * 1.08);
        Assert.InRange(z.Imaginary, x - 6, x + 6);
    }

    // Resonance (X = 0) comes shorter than λ/2 and shortens further as the wire thickens: King's tables
    // above put it near 0.469 λ at a/λ = 0.00635 (linear interpolation of X between 0.4456 and 0.4775 λ);
    // for thin wires the usual shortening is about 5 % (0.475 λ; Kraus, Antennas, dipole length chart,
    // from memory). Bounds: thin within 0.465-0.49 λ, thick within 0.01 λ of King's interpolated value.
    [Fact]
    public void ResonantLengthShortensAsTheWireThickens()
    {
        double thin = ResonantLength(1e-4), thick = ResonantLength(0.00635);
        Assert.InRange(thin, 0.465, 0.49);
        Assert.InRange(thick, 0.469 - 0.01, 0.469 + 0.01);
        Assert.True(thick < thin - 0.005, $"thick {thick} λ should resonate clearly shorter than thin {thin} λ");
    }

    private static double ResonantLength(double radius)
    {
        double lo = 0.42, hi = 0.52;
        for (int i = 0; i < 25; i++)
        {
            double mid = 0.5 * (lo + hi);
            double x = Antennas.Solve(Antennas.Dipole(mid, radius), options: new SegmentationOptions(20, 10)).InputImpedanceOhm().Imaginary;
            if (x > 0) hi = mid; else lo = mid;
        }
        return 0.5 * (lo + hi);
    }

    // Balanis §4.2, eqs. 4-37 and 4-31 region: a short dipole with a triangular current has
    // R = 20π²(l/λ)² and D = 1.5. A finite radius makes the current sag slightly below the triangle near
    // the feed (R a few % low, closing as the wire thins); we check 5 % at a = 1e-6 λ and the trend.
    [Fact]
    public void ShortDipoleMatchesTriangularCurrentFormula()
    {
        const double l = 0.05;
        double expected = 20 * Math.PI * Math.PI * l * l;
        var options = new SegmentationOptions(400);
        var thin = Antennas.Solve(Antennas.Dipole(l, 1e-6), options: options);
        var thicker = Antennas.Solve(Antennas.Dipole(l, 1e-5), options: options);
        Assert.InRange(thin.InputImpedanceOhm().Real, expected * 0.95, expected * 1.05);
        Assert.True(Math.Abs(thin.InputImpedanceOhm().Real - expected) < Math.Abs(thicker.InputImpedanceOhm().Real - expected));
        Assert.Equal(1.5, thin.DirectivityAt(Math.PI / 2, 0), 0.01);
        Assert.True(thin.InputImpedanceOhm().Imaginary < -1000, "a short dipole is strongly capacitive");
    }
}
