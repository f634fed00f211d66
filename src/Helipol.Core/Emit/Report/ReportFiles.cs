using Helipol.Design;
using Helipol.Model;

namespace Helipol.Emit.Report;

/// <summary>The report and its plots as named byte arrays, ready for <see cref="AtomicFile"/>; also design.json with the solved values.</summary>
public static class ReportFiles
{
    public static IReadOnlyList<(string Name, byte[] Bytes)> Make(PolarizerDesign design, SolvedPolarizer solved, SweepResult sweep, ToleranceResult tolerance)
    {
        var utf8 = new System.Text.UTF8Encoding(false);
        return new (string, byte[])[]
        {
            ("design.json", utf8.GetBytes(SolvedJson.Write(design, solved, sweep, tolerance))),
            ("report.md", utf8.GetBytes(ReportMarkdown.Write(design, solved, sweep, tolerance))),
            ("ar-gain.png", ReportPlots.AxialRatioAndGain(sweep, design)),
            ("vswr.png", ReportPlots.Vswr(sweep, design)),
            ("pattern-azimuth.png", ReportPlots.Polar(sweep.AzimuthCut, FormattableString.Invariant($"{design.Name}: azimuth cut, {sweep.ElevationRad * 180 / Math.PI:0.#}° elevation"))),
            ("pattern-elevation.png", ReportPlots.Polar(sweep.ElevationCut, $"{design.Name}: elevation cut, azimuth 0°/180°")),
            ("ar-map.png", ReportPlots.AxialRatioMap(solved.Search.Map, solved.Layout.LengthM, solved.Layout.RiseM, design.Name)),
        };
    }
}
