using Helipol.Design;
using Helipol.Design.Loading;
using Helipol.Engine;
using Helipol.Tests.Engine.Nec2Comparison;
using Xunit.Abstractions;

namespace Helipol.Tests.Engine.FullWave;

/// <summary>
/// Holds the engine, and the field-solved loading it is given, to the project's own full-wave
/// reference: openEMS FDTD (Debian package openems) runs of the cases in docs/fullwave/README.md,
/// committed as tables by `make validate`. NEC-2 (Debian nec2c, extended kernel) is the second
/// opinion where the FDTD extrapolation is loose (docs/fullwave/results.md).
/// </summary>
public class FullWaveTableTests(ITestOutputHelper output)
{
    // The lone element lit by a plane wave: its centre current peaks where FDTD, extrapolated to zero
    // cell size, puts it (docs/fullwave/element.csv). Within 0.5 % at the engine's default segmentation
    // (the issue's target), widened by the spread between the table's two extrapolations (power-law fit
    // through three meshes against first-order from the two finest, docs/fullwave/results.md), which is
    // the table's own uncertainty.
    [Fact]
    public void LoneElementResonatesWhereTheFullWaveTableSays()
    {
        var rows = FullWaveTable.Read("element.csv");
        var row = FullWaveTable.Extrapolated(rows, "e22.5x0.8");
        double reference = row.Number("resonance_mhz") * 1e6;
        // Meshed for the top of the 5725-5875 MHz band the element is cut for, as a design there would be.
        const double bandTopHz = 5.875e9;
        var (mesh, centre) = LoneElement.Mesh(row.Number("length_mm") * 1e-3, row.Number("wire_diameter_mm") / 2 * 1e-3, bandTopHz);
        double engine = LoneElement.GoldenMaximum(f => MomSolver.Solve(mesh, f).InputCurrentA(centre).Magnitude, 5.4e9, bandTopHz, 1e4);
        double error = (engine - reference) / reference;
        output.WriteLine(FormattableString.Invariant($"e22.5x0.8: engine {engine / 1e6:0.0} MHz, FDTD extrapolated {reference / 1e6:0.0} MHz, {100 * error:+0.00;-0.00} %"));
        Assert.InRange(Math.Abs(error), 0, 0.005 + ExtrapolationSpread(rows, "e22.5x0.8"));
    }

    // Fed dipoles across the FDTD runs' 0.5 mm gap: the reactance zero within 0.5 % of the FDTD
    // extrapolation (docs/fullwave/dipoles.csv) widened by its spread as above, and R within 5 %.
    [Theory]
    [InlineData("d24.3x1.0")]
    [InlineData("d22.5x0.8")]
    [InlineData("d24.0x0.5")]
    public void FedDipoleResonatesWhereTheFullWaveTableSays(string caseName)
    {
        var rows = FullWaveTable.Read("dipoles.csv");
        var row = FullWaveTable.Extrapolated(rows, caseName);
        double reference = row.Number("resonance_mhz") * 1e6, referenceR = row.Number("resistance_ohm");
        // Swept from 8 % below to 3 % above the reference, as a design around it would be.
        var (f, r) = FullWaveEngine.Resonance(row.Number("length_mm") * 1e-3, row.Number("wire_diameter_mm") / 2 * 1e-3, null, 0.92 * reference, 1.03 * reference);
        double error = (f - reference) / reference;
        output.WriteLine(FormattableString.Invariant($"{caseName}: engine {f / 1e6:0.0} MHz {r:0.00} Ω, FDTD extrapolated {reference / 1e6:0.0} MHz {referenceR:0.00} Ω, {100 * error:+0.00;-0.00} %, R {100 * (r - referenceR) / referenceR:+0.0;-0.0} %"));
        Assert.InRange(Math.Abs(error), 0, 0.005 + ExtrapolationSpread(rows, caseName));
        Assert.InRange(Math.Abs(r - referenceR) / referenceR, 0, 0.05);
    }

    // The 24.0 × 0.5 mm dipole in each surrounding of docs/fullwave/loading.csv: the engine, given
    // helipol's field-solved added inductance, shifts the resonance within 1.5 percentage points of
    // the FDTD shift on its finest mesh (the issue's criterion). The sleeve uses Richmond and Newman's
    // closed form, which the field solve reproduces (CrossSectionSolveTests).
    [Theory]
    [InlineData("sleeve")]
    [InlineData("foam")]
    [InlineData("tape-hug")]
    [InlineData("tape-tent-0.5")]
    [InlineData("tape-tent-1.0")]
    [InlineData("tape-hug-glue")]
    public void LoadingShiftMatchesTheFullWaveTable(string caseName)
    {
        const double lengthM = 24.0e-3, a = 0.25e-3;
        var row = FullWaveTable.Finest(FullWaveTable.Read("loading.csv"), caseName);
        double fdtd = row.Number("shift_percent");
        var (bare, _) = FullWaveEngine.Resonance(lengthM, a, null, 5.0e9, 6.4e9);
        var (loaded, _) = FullWaveEngine.Resonance(lengthM, a, Coating(caseName, a), 4.8e9, 6.4e9);
        double shift = 100 * (loaded - bare) / bare;
        output.WriteLine(FormattableString.Invariant($"{caseName}: engine {shift:0.00} %, FDTD {fdtd:0.00} % (cell {row["cell_mm"]} mm), ratio {shift / fdtd:0.00}"));
        Assert.InRange(shift - fdtd, -1.5, 1.5);
    }

    /// <summary>The case's surroundings as helipol models them (docs/fullwave/README.md geometry).</summary>
    internal static DielectricCoating? Coating(string caseName, double a)
    {
        const double tape = 0.15e-3;
        if (caseName == "sleeve") return new DielectricCoating(3.0, a + tape);
        var foam = new ElementCrossSection(a, 1.05, 4e-3, 5e-3, null, 0, 1, 0, 1, 0, null);
        var hug = foam with { WrapPermittivity = 3.0, WrapThicknessM = tape };
        var section = caseName switch
        {
            "foam" => foam,
            "tape-hug" => hug,
            "tape-tent-0.5" => hug with { TentDistanceM = 0.5e-3 },
            "tape-tent-1.0" => hug with { TentDistanceM = 1.0e-3 },
            // The fillet fills the cusps |x| ≤ a beside the wire; the model's glue coat over the wire's
            // top is made negligible (0.01 mm).
            "tape-hug-glue" => hug with { GluePermittivity = 2.5, GlueThicknessM = 0.01e-3 },
            _ => throw new ArgumentException(caseName),
        };
        return new Surroundings(section, 1).CoatingFor(a);
    }

    /// <summary>Relative spread between the table's extrapolation and first-order Richardson from its two finest meshes.</summary>
    private static double ExtrapolationSpread(IReadOnlyList<IReadOnlyDictionary<string, string>> rows, string caseName)
    {
        var meshes = rows.Where(r => r["case"] == caseName && r.Number("cell_mm") > 0).OrderBy(r => r.Number("cell_mm")).Take(2).ToArray();
        double h1 = meshes[0].Number("cell_mm"), f1 = meshes[0].Number("resonance_mhz");
        double h2 = meshes[1].Number("cell_mm"), f2 = meshes[1].Number("resonance_mhz");
        double firstOrder = f1 + (f1 - f2) * h1 / (h2 - h1);
        double table = FullWaveTable.Extrapolated(rows, caseName).Number("resonance_mhz");
        return Math.Abs(table - firstOrder) / table;
    }
}
