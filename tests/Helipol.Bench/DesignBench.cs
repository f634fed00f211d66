using System.Diagnostics;
using System.Globalization;
using Helipol.Design;
using Helipol.Model;

namespace Helipol.Bench;

/// <summary>
/// The polarizer solver's figures: wall time and field solves for solving each demo
/// design, and for a 500-build Monte Carlo. Each is run a few times; the median and the minimum
/// are printed. Targets: one design ≤ 2 s, 500 builds ≤ 5 s, on this 2-core machine.
/// </summary>
public static class DesignBench
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static void Run(int runs = 3)
    {
        var root = FindDesigns();
        Console.WriteLine();
        Console.WriteLine(string.Create(Inv, $"Polarizer solver: solve and tolerance per demo design, {runs} runs each, {Environment.ProcessorCount} cores"));
        Console.WriteLine("| design | solve median s | solve min s | field solves | geometries | 500 builds median s | 500 builds min s | field solves |");
        Console.WriteLine("|---|---|---|---|---|---|---|---|");
        foreach (var file in Directory.GetFiles(root, "*.yaml").OrderBy(f => f, StringComparer.Ordinal))
        {
            var design = DesignResolver.ReadFile(file, Path.GetFileName(file));
            var solveTimes = new List<double>();
            var mcTimes = new List<double>();
            long solves = 0, mcSolves = 0;
            int geometries = 0;
            SolvedPolarizer? solved = null;
            for (int r = 0; r < runs; r++)
            {
                var counter = new FieldSolveCounter();
                var sw = Stopwatch.StartNew();
                solved = PolarizerSolver.Solve(design, counter);
                solveTimes.Add(sw.Elapsed.TotalSeconds);
                solves = counter.Count;
                geometries = solved.Search.Evaluations;
            }
            for (int r = 0; r < runs; r++)
            {
                var counter = new FieldSolveCounter();
                var sw = Stopwatch.StartNew();
                ToleranceAnalysis.Run(design, solved!.Build, builds: 500, counter: counter);
                mcTimes.Add(sw.Elapsed.TotalSeconds);
                mcSolves = counter.Count;
            }
            Console.WriteLine(string.Create(Inv,
                $"| {design.Name} | {Median(solveTimes):0.00} | {solveTimes.Min():0.00} | {solves} | {geometries} | {Median(mcTimes):0.00} | {mcTimes.Min():0.00} | {mcSolves} |"));
        }
        Console.WriteLine("Solve: coarse map + Nelder–Mead + compass polish, candidates scored at 3 frequencies, 10° elevation steps, one azimuth period; then the full evaluation and the practice column.");
        Console.WriteLine("Monte Carlo: 500 builds at band low/centre/high on the analysis cone every 10° of azimuth, plus sensitivities.");
    }

    private static double Median(List<double> v)
    {
        var s = v.OrderBy(x => x).ToArray();
        return s.Length % 2 == 1 ? s[s.Length / 2] : 0.5 * (s[s.Length / 2 - 1] + s[s.Length / 2]);
    }

    private static string FindDesigns()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !Directory.Exists(Path.Combine(dir.FullName, "designs"))) dir = dir.Parent;
        return Path.Combine(dir?.FullName ?? ".", "designs");
    }
}
