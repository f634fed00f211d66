using System.Numerics;
using Helipol.Design;
using Helipol.Engine;
using Helipol.Model;
using Xunit.Abstractions;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>
/// The main job against NEC-2 (Debian nec2c 1.3; cards per the NEC-2 user's guide): a 24.3 mm,
/// 1.0 mm dipole whip at 5.8 GHz with 3 or 5 helical parasitic elements of 0.8 mm wire on a 28 mm
/// former, built by the polarizer layer (<see cref="PolarizerWires"/>) and written to NEC-2 edge for
/// edge. Perfect conductors in air: NEC-2 has no model of a dielectric coating, so the bare-wire case
/// is compared. Each helix edge is one NEC segment (about 5.7 wire radii; the whip's 11 segments are
/// 4.4 radii), short by the NEC-2 user's guide's rule of thumb, so some spread is expected.
/// </summary>
public class Nec2PolarizerTests(ITestOutputHelper output)
{
    private const double FrequencyHz = 5.8e9;
    private const double WhipLengthM = 24.3e-3, WhipRadiusM = 0.5e-3, FormerDiameterM = 28e-3, WireRadiusM = 0.4e-3;

    private static PolarizerBuild Build(int count, double lengthMm, double riseMm, Winding winding) =>
        new(WhipKind.Dipole, WhipLengthM, WhipRadiusM, FormerDiameterM, 0, winding,
            PolarizerBuild.Uniform(count, lengthMm * 1e-3, riseMm * 1e-3), WireRadiusM, null, 1, Surroundings.None(WireRadiusM));

    private static (MomSolution Engine, Nec2Output Nec) Solve(WireModel model)
    {
        var engine = MomSolver.Solve(MeshedModel.Create(model, FrequencyHz), FrequencyHz);
        var nec = Nec2c.Run(Nec2Deck.Write(model, FrequencyHz, [Nec2Cut.Horizon(5)]));
        return (engine, nec);
    }

    // On the horizon every 5° of azimuth. The practice layout (16 mm elements, 12.7 mm rise) leaves
    // the field nearly linear (AR 17-26 dB); the layout near the solver's optimum for the bare-wire
    // design (3 elements, 22.1 mm, 16.6 mm rise; tests/Helipol.Tests/data/designs/pec-air-search.yaml)
    // brings it to 3-5 dB. Required, per azimuth:
    //  - the same sense (IEEE Std 145 in both; see Nec2SenseConventionTests);
    //  - co-polar gain (the sense radiated) within 0.4 dB and total gain within 0.3 dB;
    //  - axial ratio within 0.6 dB where it is under 10 dB; above, within 10 % of its value in dB:
    //    a nearly linear field's AR is the ratio of its large to its small axis, and the small axis
    //    is the difference of nearly equal circular parts, so a small change in element current
    //    moves it much (observed: 1.0-1.3 dB apart at AR 18-26 dB, the engine higher).
    [SkippableTheory]
    [InlineData(3, 16.0, 12.7, Winding.Right)]
    [InlineData(3, 16.0, 12.7, Winding.Left)]
    [InlineData(5, 16.0, 12.7, Winding.Right)]
    [InlineData(5, 16.0, 12.7, Winding.Left)]
    [InlineData(3, 22.1, 16.6, Winding.Right)]
    [InlineData(3, 22.1, 16.6, Winding.Left)]
    [InlineData(5, 22.1, 16.6, Winding.Right)]
    [InlineData(5, 22.1, 16.6, Winding.Left)]
    public void HorizonPolarizationAgreesWithNec2(int count, double lengthMm, double riseMm, Winding winding)
    {
        Nec2c.Require();
        var (engine, nec) = Solve(PolarizerWires.Build(Build(count, lengthMm, riseMm, winding), FrequencyHz));
        Assert.Equal(72, nec.Pattern.Count);
        double worstAr = 0, worstCo = 0, worstTotal = 0;
        foreach (var p in nec.Pattern)
        {
            var g = engine.GainAt(Math.PI / 2, p.PhiDeg * Math.PI / 180);
            string at = FormattableString.Invariant($"φ = {p.PhiDeg}°");
            var expected = p.Sense switch { "RIGHT" => PolarizationSense.Rhcp, "LEFT" => PolarizationSense.Lhcp, _ => PolarizationSense.Linear };
            Assert.True(expected == g.Sense, $"{at}: NEC {p.Sense}, engine {g.Sense}");
            double co = g.Sense == PolarizationSense.Rhcp ? g.GainRhcpDbic : g.GainLhcpDbic;
            double necCo = p.Sense == "RIGHT" ? p.GainRhcpDbic : p.GainLhcpDbic;
            double arLimit = p.AxialRatioDb < 10 ? 0.6 : 0.1 * p.AxialRatioDb;
            Assert.True(Math.Abs(co - necCo) <= 0.4, $"{at}: co-polar {co:0.00} vs NEC {necCo:0.00} dBic");
            Assert.True(Math.Abs(g.GainTotalDbi - p.GainTotalDb) <= 0.3, $"{at}: total {g.GainTotalDbi:0.00} vs NEC {p.GainTotalDb:0.00} dBi");
            Assert.True(Math.Abs(g.AxialRatioDb - p.AxialRatioDb) <= arLimit, $"{at}: AR {g.AxialRatioDb:0.00} vs NEC {p.AxialRatioDb:0.00} dB");
            worstAr = Math.Max(worstAr, Math.Abs(g.AxialRatioDb - p.AxialRatioDb));
            worstCo = Math.Max(worstCo, Math.Abs(co - necCo));
            worstTotal = Math.Max(worstTotal, Math.Abs(g.GainTotalDbi - p.GainTotalDb));
        }
        output.WriteLine(FormattableString.Invariant(
            $"N={count} L={lengthMm} h={riseMm} {winding}: sense {nec.Pattern[0].Sense}; AR {nec.Pattern.Min(p => p.AxialRatioDb):0.0}-{nec.Pattern.Max(p => p.AxialRatioDb):0.0} dB; worst ΔAR {worstAr:0.00} dB, Δco {worstCo:0.00} dB, Δtotal {worstTotal:0.00} dB; Z engine {Fmt(engine.InputImpedanceOhm())}, NEC {Fmt(nec.ImpedanceOhm)}"));
    }

    // The two windings are mirror images: each solver gives them opposite senses, and the engine's
    // sense for each winding is NEC-2's.
    [SkippableFact]
    public void OppositeWindingsGiveOppositeSensesInBoth()
    {
        Nec2c.Require();
        var right = Solve(PolarizerWires.Build(Build(3, 22.1, 16.6, Winding.Right), FrequencyHz));
        var left = Solve(PolarizerWires.Build(Build(3, 22.1, 16.6, Winding.Left), FrequencyHz));
        Assert.All(right.Nec.Pattern, p => Assert.NotEqual(p.Sense, left.Nec.At(90, p.PhiDeg).Sense));
        var r = right.Engine.GainAt(Math.PI / 2, 0).Sense;
        var l = left.Engine.GainAt(Math.PI / 2, 0).Sense;
        Assert.NotEqual(r, l);
        Assert.Equal(right.Nec.At(90, 0).Sense == "RIGHT" ? PolarizationSense.Rhcp : PolarizationSense.Lhcp, r);
    }

    // Input impedance at the whip's feed. The whip is very thick (length 49 radii) and its segments
    // are under 5 radii in both codes, where the feed-region reactance depends on the feed model:
    // NEC-2's source fills a segment, the engine's gap is half a radius wide (Mesh/FeedGap.cs). Observed,
    // bare whip: engine 85.7 + j14.6 Ω, NEC (thin-wire kernel) 84.3 + j19.6 Ω (before the engine's end caps,
    // tube kernel and finite gap it read 77.8 + j5.6 Ω; NEC-2's extended kernel gives 83.9 + j14.7 Ω,
    // Nec2Comparison/FeedGapTests). So the whip alone
    // is held to R within 10 % and X within 20 Ω, and what the polarizer does to the whip is compared
    // as the change it makes, ΔZ = Z(with elements) − Z(bare whip), which must agree within 15 % of
    // NEC's ΔZ plus 3 Ω. Observed ΔZ (engine vs NEC): 3 × 16 mm −12.1 + j7.0 vs −12.5 + j5.5 Ω;
    // 5 × 16 mm −17.9 + j12.1 vs −18.5 + j9.9 Ω; 3 × 22.1 mm −14.7 + j59.5 vs −19.8 + j54.3 Ω.
    [SkippableTheory]
    [InlineData(3, 16.0, 12.7)]
    [InlineData(5, 16.0, 12.7)]
    [InlineData(3, 22.1, 16.6)]
    public void InputImpedanceChangeAgreesWithNec2(int count, double lengthMm, double riseMm)
    {
        Nec2c.Require();
        var bare = Solve(PolarizerWires.BareWhip(WhipKind.Dipole, WhipLengthM, WhipRadiusM));
        var with = Solve(PolarizerWires.Build(Build(count, lengthMm, riseMm, Winding.Right), FrequencyHz));
        Complex engineBare = bare.Engine.InputImpedanceOhm(), necBare = bare.Nec.ImpedanceOhm;
        Complex engineChange = with.Engine.InputImpedanceOhm() - engineBare;
        Complex necChange = with.Nec.ImpedanceOhm - necBare;
        output.WriteLine(FormattableString.Invariant(
            $"bare whip: engine {Fmt(engineBare)}, NEC {Fmt(necBare)}; N={count} L={lengthMm} h={riseMm}: engine {Fmt(with.Engine.InputImpedanceOhm())}, NEC {Fmt(with.Nec.ImpedanceOhm)}; ΔZ engine {Fmt(engineChange)}, NEC {Fmt(necChange)}"));
        Assert.InRange(engineBare.Real, necBare.Real * 0.9, necBare.Real * 1.1);
        Assert.InRange(engineBare.Imaginary, necBare.Imaginary - 20, necBare.Imaginary + 20);
        Assert.True((engineChange - necChange).Magnitude <= 0.15 * necChange.Magnitude + 3,
            $"ΔZ engine {Fmt(engineChange)}, NEC {Fmt(necChange)}");
    }

    private static string Fmt(Complex z) => FormattableString.Invariant($"{z.Real:0.0}{(z.Imaginary < 0 ? " − j" : " + j")}{Math.Abs(z.Imaginary):0.0} Ω");
}
