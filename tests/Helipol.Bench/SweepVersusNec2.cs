using System.Diagnostics;
using System.Globalization;
using System.Text;
using Helipol.Design;
using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Bench;

/// <summary>
/// The 201-frequency sweep of the 5.8 GHz model (the 24.3 mm × 1.0 mm whip with five 22.1 mm helical
/// elements of 0.8 mm wire, 16.6 mm rise, on a 28 mm former, in air) with a 72-point horizon cut per
/// frequency, timed in the engine and in nec2c (the NEC-2 deck: the engine's own segments, extended
/// kernel, FR over the same 201 frequencies, RP with the same 72 directions), in the
/// same run, as a ratio. Both on one core: nec2c is single-threaded, and the engine's sweep is given one
/// worker so the ratio compares the methods, not the core count. Prints figures only.
/// </summary>
public static class SweepVersusNec2
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    private const string Nec2c = "/usr/bin/nec2c";

    public static void Run(int runs = 5)
    {
        const double f0 = 5.6e9, f1 = 6.0e9;
        var freqs = Enumerable.Range(0, 201).Select(i => f0 + (f1 - f0) * i / 200).ToArray();
        var build = new PolarizerBuild(WhipKind.Dipole, 24.3e-3, 0.5e-3, 28e-3, 0, Winding.Right,
            PolarizerBuild.Uniform(5, 22.1e-3, 16.6e-3), 0.4e-3, null, 1, Surroundings.None(0.4e-3));
        var model = PolarizerWires.Build(build, f1);
        var engine = new List<double>();
        var parts = new List<(double Create, double Sweep, double Cut)>();
        int unknowns = 0, segments = 0;
        for (int r = 0; r < runs + 1; r++)
        {
            var sw = Stopwatch.StartNew();
            var mesh = MeshedModel.Create(model, f1);
            double tCreate = sw.Elapsed.TotalSeconds;
            var solutions = MomSolver.Sweep(mesh, freqs, 1);
            double tSweep = sw.Elapsed.TotalSeconds - tCreate;
            double sum = 0;
            foreach (var s in solutions)
                for (int j = 0; j < 72; j++) sum += s.GainAt(Math.PI / 2, j * 5 * Math.PI / 180).GainRhcpDbic;
            GC.KeepAlive(sum);
            if (r > 0) engine.Add(sw.Elapsed.TotalSeconds); // the first run warms the JIT
            if (r > 0) parts.Add((tCreate, tSweep, sw.Elapsed.TotalSeconds - tCreate - tSweep));
            unknowns = mesh.UnknownCount;
            segments = mesh.SegmentCount;
        }
        Console.WriteLine();
        Console.WriteLine(string.Create(Inv, $"201-point sweep with a 72-point cut, 5.8 GHz model ({segments} segments, {unknowns} unknowns), one core, median of {runs}"));
        if (!File.Exists(Nec2c))
        {
            Console.WriteLine(string.Create(Inv, $"| engine | {Median(engine):0.000} s |  (nec2c not installed: no ratio)"));
            return;
        }
        var meshForDeck = MeshedModel.Create(model, f1);
        string deck = Deck(meshForDeck, f0, (f1 - f0) / 200, 201);
        if (Environment.GetEnvironmentVariable("HELIPOL_BENCH_DECK") is { Length: > 0 } keep) File.WriteAllText(keep, deck);
        var nec = new List<double>();
        for (int r = 0; r < runs; r++) nec.Add(RunNec2(deck));
        Console.WriteLine("| solver | median s | minimum s |");
        Console.WriteLine("|---|---:|---:|");
        Console.WriteLine(string.Create(Inv, $"| engine (MeshedModel.Create + Sweep + 72 gains per frequency) | {Median(engine):0.000} | {engine.Min():0.000} |"));
        Console.WriteLine(string.Create(Inv, $"| nec2c, same segments, FR 201 + RP 72 | {Median(nec):0.000} | {nec.Min():0.000} |"));
        var least = parts.OrderBy(p => p.Create + p.Sweep + p.Cut).First();
        Console.WriteLine(string.Create(Inv, $"engine's fastest run by step: mesh and tables {least.Create:0.000} s, 201 fills and solves {least.Sweep:0.000} s, 72-point cuts {least.Cut:0.000} s"));
        Console.WriteLine(string.Create(Inv, $"ratio engine / nec2c: medians {Median(engine) / Median(nec):0.00}, minima {engine.Min() / nec.Min():0.00} (goal ≤ 0.5; the minima are the least disturbed by other work, load average now {LoadAverage()})"));
    }

    /// <summary>
    /// NEC-2 deck (user's guide, part III) with the engine's segments as laid (end-cap extensions
    /// included): consecutive collinear segments of a wire become one GW card. The whip (wire 0, fed at
    /// its centre node) gets one segment more, so that NEC-2's source sits on a centre segment.
    /// </summary>
    private static string Deck(MeshedModel mesh, double startHz, double stepHz, int count)
    {
        var sb = new StringBuilder("CM engine sweep comparison\nCE\n");
        var segs = mesh.Segments;
        int tag = 0, feedTag = 0, feedSeg = 0;
        for (int i = 0; i < segs.Length;)
        {
            int j = i + 1;
            while (j < segs.Length && segs[j].WireIndex == segs[i].WireIndex
                   && Vector3.Dot(segs[j].Direction, segs[i].Direction) > 1 - 1e-9 && segs[j].Start.Equals(segs[j - 1].End)) j++;
            int n = j - i;
            Vector3 a = segs[i].Start, b = segs[j - 1].End;
            tag++;
            if (segs[i].WireIndex == 0) { n++; feedTag = tag; feedSeg = (n + 1) / 2; }
            sb.Append(Inv, $"GW {tag} {n} {a.X * 1e3:R} {a.Y * 1e3:R} {a.Z * 1e3:R} {b.X * 1e3:R} {b.Y * 1e3:R} {b.Z * 1e3:R} {segs[i].RadiusM * 1e3:R}\n");
            i = j;
        }
        sb.Append("GS 0 0 0.001\nGE 0\nEK\n");
        sb.Append(Inv, $"EX 0 {feedTag} {feedSeg} 0 1 0\n");
        sb.Append(Inv, $"FR 0 {count} 0 0 {startHz / 1e6:R} {stepHz / 1e6:R}\n");
        sb.Append("RP 0 1 72 1000 90 0 0 5\nEN\n");
        return sb.ToString();
    }

    private static double RunNec2(string deck)
    {
        var dir = Directory.CreateTempSubdirectory("helipol-bench-");
        try
        {
            var input = Path.Combine(dir.FullName, "deck.nec");
            File.WriteAllText(input, deck);
            var psi = new ProcessStartInfo(Nec2c) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
            psi.ArgumentList.Add("-i"); psi.ArgumentList.Add(input);
            psi.ArgumentList.Add("-o"); psi.ArgumentList.Add(Path.Combine(dir.FullName, "out.txt"));
            var sw = Stopwatch.StartNew();
            using var p = Process.Start(psi)!;
            p.StandardOutput.ReadToEnd();
            p.StandardError.ReadToEnd();
            p.WaitForExit();
            return sw.Elapsed.TotalSeconds;
        }
        finally { dir.Delete(true); }
    }

    private static string LoadAverage()
    {
        try { return File.ReadAllText("/proc/loadavg").Split(' ')[0]; }
        catch (IOException) { return "unknown"; }
        catch (UnauthorizedAccessException) { return "unknown"; }
    }

    private static double Median(List<double> v)
    {
        var s = v.OrderBy(x => x).ToArray();
        return s.Length % 2 == 1 ? s[s.Length / 2] : 0.5 * (s[s.Length / 2 - 1] + s[s.Length / 2]);
    }
}
