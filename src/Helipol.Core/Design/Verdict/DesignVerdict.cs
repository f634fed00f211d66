using System.Globalization;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>A design's grade, the figure behind each criterion, and the single most useful next step.</summary>
public sealed record DesignVerdict(Grade Grade, IReadOnlyList<string> Reasons, string NextStep, string Figures)
{
    /// <summary>The one line a terminal shows: "name: grade: figures; next: step".</summary>
    public string Line(string name) => $"{name}: {Grade.Word()}: {Figures}; next: {NextStep}";
}

/// <summary>
/// Grades a solved design on four criteria, each graded alone; the verdict is the worst of them.
/// <list type="bullet">
/// <item>Axial ratio: the worst true axial ratio in the wanted sense over the band and the coverage
/// window (<c>solve.elevations</c>, <c>solve.azimuth_span</c>). Works up to <c>solve.axial_ratio_limit</c>,
/// marginal up to 3 dB more; beyond that, or where any direction radiates the wrong sense, it fails.</item>
/// <item>Realized gain in the wanted sense (IEEE Std 145: gain × (1 − |Γ|²), Γ against
/// <c>solve.receiver_impedance</c>) over the bare whip's, mean over the window, at the band frequency where
/// it is smallest. A perfect conversion gains 3 dB, the whip's polarization mismatch to a circular
/// partner (common practice, no source): works from +1 dB, marginal above 0 dB, fails at or below 0 dB
/// (no better than leaving the whip bare).</item>
/// <item>VSWR against the receiver over the band: works up to 3, marginal up to 6; above 6 it fails when
/// the polarizer made it worse than the bare whip's (and is marginal when the whip alone is that poor).
/// Limits 3 and 6 are common practice, no source.</item>
/// <item>Yield of the simulated builds (when a tolerance run is given), judged on the axial-ratio
/// criterion: works from 50 %, marginal below; a low yield never fails a design on its own, since
/// tighter cutting raises it.</item>
/// </list>
/// </summary>
public static class VerdictJudge
{
    public const double MarginalArExtraDb = 3;
    public const double WorksGainDb = 1;
    public const double WorksVswr = 3, MarginalVswr = 6;
    public const double WorksYield = 0.5;

    public static DesignVerdict For(PolarizerDesign design, SolvedPolarizer solved, ToleranceResult? tolerance = null)
    {
        var inv = CultureInfo.InvariantCulture;
        var s = design.Solve;
        double limit = s.AxialRatioLimitDb;
        string sense = ChoiceWords.Label(solved.Sense);
        string window = Window(design);
        var reasons = new List<string>();
        var grades = new List<Grade>();

        // Axial ratio and sense.
        var worst = solved.WorstPoint;
        bool wrongSense = solved.Points.Any(p => !p.AllWantedSense);
        double worstAr = solved.WorstAxialRatioDb;
        Grade arGrade = wrongSense ? Grade.Fails : worstAr <= limit ? Grade.Works : worstAr <= limit + MarginalArExtraDb ? Grade.Marginal : Grade.Fails;
        string where = string.Create(inv, $"at {worst.FrequencyHz / 1e6:0.#} MHz, elevation {Deg(worst.Worst.Direction.ElevationRad)}°, azimuth {Deg(worst.Worst.Direction.AzimuthRad)}°");
        string arText = wrongSense
            ? string.Create(inv, $"wrong sense in the coverage window: {SenseWord(worst.Worst.Sense)} with axial ratio {Ar(worst.Worst.AxialRatioDb)} {where}, where {sense} is wanted")
            : string.Create(inv, $"worst axial ratio {Ar(worstAr)} {sense} over the band and {window} (limit {limit:0.#} dB), {where}");
        reasons.Add($"{arText}: {arGrade.Word()}");
        grades.Add(arGrade);

        // Realized gain against the bare whip.
        double advantage = double.NaN;
        if (solved.BareWhip.Count == solved.Points.Count && solved.Points.Count > 0)
        {
            advantage = solved.Points.Zip(solved.BareWhip, (p, b) => p.RealizedGainDbic(solved.Sense) - b.RealizedGainDbic(solved.Sense)).Min();
            Grade g = advantage >= WorksGainDb ? Grade.Works : advantage > 0 ? Grade.Marginal : Grade.Fails;
            reasons.Add($"realized {sense} gain {SignedNumber.Format(advantage, "0.0")} dB against the bare whip (mean over the window, at its weakest band frequency; a perfect conversion gains about 3 dB): {g.Word()}");
            grades.Add(g);
        }

        // VSWR.
        double vswr = solved.Points.Max(p => p.Vswr);
        double bareVswr = solved.BareWhip.Count > 0 ? solved.BareWhip.Max(p => p.Vswr) : double.NaN;
        Grade vGrade = vswr <= WorksVswr ? Grade.Works : vswr <= MarginalVswr ? Grade.Marginal : !(vswr > bareVswr) ? Grade.Marginal : Grade.Fails;
        reasons.Add(string.Create(inv, $"VSWR against {s.ReceiverOhm:0.#} Ω up to {Vswr(vswr)} in the band (bare whip {Vswr(bareVswr)}): {vGrade.Word()}"));
        grades.Add(vGrade);

        // Yield.
        if (tolerance is not null)
        {
            Grade g = tolerance.Yield >= WorksYield ? Grade.Works : Grade.Marginal;
            reasons.Add(string.Create(inv, $"yield {tolerance.Yield * 100:0.#} % of {tolerance.Builds} simulated builds keep the axial ratio ≤ {limit:0.#} dB in the wanted sense over the band and window ({tolerance.UsableYield * 100:0.#} % stay within {limit + MarginalArExtraDb:0.#} dB, short of failing): {g.Word()}"));
            grades.Add(g);
        }

        var grade = grades.Max();
        string figures = string.Join(", ", new[]
        {
            wrongSense ? string.Create(inv, $"wrong sense ({SenseWord(worst.Worst.Sense)}) at {worst.FrequencyHz / 1e6:0.#} MHz, {Deg(worst.Worst.Direction.ElevationRad)}°") : $"worst AR {Ar(worstAr)} {sense}",
            double.IsFinite(advantage) ? $"realized gain {SignedNumber.Format(advantage, "0.0")} dB vs bare whip" : null,
            $"VSWR {Vswr(vswr)}",
            tolerance is null ? null : string.Create(inv, $"yield {tolerance.Yield * 100:0.#} %"),
        }.Where(x => x is not null));
        return new DesignVerdict(grade, reasons, NextStep(design, solved, tolerance, arGrade, advantage, vswr, bareVswr, grade), figures);
    }

    private static string NextStep(PolarizerDesign design, SolvedPolarizer solved, ToleranceResult? tolerance, Grade arGrade, double advantage, double vswr, double bareVswr, Grade grade)
    {
        var inv = CultureInfo.InvariantCulture;
        if (arGrade != Grade.Works)
        {
            if (solved.Search.LimitsReached.Count > 0) return $"widen the search ({solved.Search.LimitsReached[0]})";
            if (solved.LengthPinned || solved.RisePinned)
            {
                var keys = new[] { solved.LengthPinned ? Keys.PolarizerElementLength : null, solved.RisePinned ? Keys.PolarizerElementRise : null }.Where(k => k is not null);
                return $"let the solver choose: set {string.Join(" and ", keys)} to auto";
            }
            if (NarrowerWindow(design, solved) is { } w) return w;
            if (solved.CountPinned && solved.Layout.Count < 8) return $"more elements ({Keys.PolarizerElements}: auto)";
            return string.Create(inv, $"a larger former: more than {solved.Layout.OuterDiameterM * 1e3:0} mm across ({Keys.PolarizerFormerOuterDiameter}, {Keys.SolveSearchOuterDiameter})");
        }
        if (advantage <= WorksGainDb && vswr > bareVswr)
            return string.Create(inv, $"match the whip to the receiver: the polarizer raises VSWR from {Vswr(bareVswr)} to {Vswr(vswr)}");
        if (vswr > WorksVswr) return string.Create(inv, $"match the whip to the receiver (VSWR {Vswr(vswr)})");
        if (tolerance is not null && tolerance.Yield < WorksYield)
        {
            double spreadMm = design.Tolerance.ElementLengthM * 1e3;
            if (double.IsFinite(tolerance.CutToleranceMm) && tolerance.CutToleranceMm < spreadMm)
                return string.Create(inv, $"cut every element to within ±{tolerance.CutToleranceMm:0.0#} mm, tighter than the ±{spreadMm:0.0#} mm assumed ({Keys.ToleranceElementLength})");
            string median = double.IsFinite(tolerance.ArP50Db) ? string.Create(inv, $"{tolerance.ArP50Db:0.0} dB") : "the wrong sense";
            return string.Create(inv, $"more axial-ratio margin: build errors take the worst axial ratio past {design.Solve.AxialRatioLimitDb:0.#} dB (median build {median}); {(solved.CountPinned ? "more elements or " : "")}a narrower coverage window ({Keys.SolveElevations}, {Keys.SolveAzimuthSpan})");
        }
        if (tolerance is not null && double.IsFinite(tolerance.CutToleranceMm))
            return string.Create(inv, $"{(grade == Grade.Works ? "build it; " : "")}cut every element to within ±{tolerance.CutToleranceMm:0.0#} mm and hold the rise to ±{tolerance.RiseToleranceMm:0.0#} mm");
        return grade == Grade.Works ? "build it" : "run 'helipol tolerance' to see how precisely to cut";
    }

    /// <summary>
    /// The widest contiguous run of window elevations, at least 10° wide, where every band frequency keeps
    /// the wanted sense within the axial-ratio limit; null when there is none or it is the whole window.
    /// </summary>
    private static string? NarrowerWindow(PolarizerDesign design, SolvedPolarizer solved)
    {
        var rows = solved.Points[0].ByElevation.Select(r => r.ElevationRad).ToArray();
        if (rows.Length < 2) return null;
        var ok = rows.Select((el, i) => solved.Points.All(p => p.ByElevation.Count == rows.Length && p.ByElevation[i].WorstWantedArDb <= design.Solve.AxialRatioLimitDb)).ToArray();
        int bestStart = -1, bestLength = 0;
        for (int i = 0; i < ok.Length; i++)
        {
            if (!ok[i]) continue;
            int j = i;
            while (j + 1 < ok.Length && ok[j + 1]) j++;
            if (j - i + 1 > bestLength) { bestStart = i; bestLength = j - i + 1; }
            i = j;
        }
        if (bestStart < 0 || bestLength == rows.Length) return null;
        double from = rows[bestStart], to = rows[bestStart + bestLength - 1];
        if (to - from < 10 * Math.PI / 180 - 1e-9) return null;
        return string.Create(CultureInfo.InvariantCulture, $"a narrower coverage window: the axial ratio holds from {Deg(from)}° to {Deg(to)}° elevation ({Keys.SolveElevations})");
    }

    public static string Window(PolarizerDesign design)
    {
        var s = design.Solve;
        string az = s.AzimuthSpanRad >= 2 * Math.PI - 1e-9 ? "all azimuths" : $"azimuths within ±{Deg(s.AzimuthSpanRad / 2)}°";
        return $"elevations {Deg(s.ElevationFromRad)}° to {Deg(s.ElevationToRad)}°, {az}";
    }

    private static string Deg(double rad) => SignedNumber.Plain(rad * 180 / Math.PI, "0.#");
    private static string Ar(double db) => double.IsFinite(db) ? db.ToString("0.0", CultureInfo.InvariantCulture) + " dB" : "infinite";
    private static string Vswr(double v) => double.IsFinite(v) ? v.ToString("0.0", CultureInfo.InvariantCulture) : "∞";
    private static string SenseWord(Helipol.Engine.PolarizationSense s) => SenseLabels.Of(s);
}
