using System.Diagnostics;
using System.Globalization;
using Helipol.Engine;
using Helipol.Engine.Solve;
using Complex = System.Numerics.Complex;

namespace Helipol.Bench;

/// <summary>
/// `make bench`: engine speed as a table of medians, a fitted scaling exponent and ratios. Prints
/// figures only; nothing here passes or fails.
/// </summary>
public static class Program
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static int Main(string[] args)
    {
        if (args.Length > 0 && args[0] == "sweep") { SweepVersusNec2.Run(); return 0; }
        if (args.Length > 0 && args[0] == "loading") { LoadingBench.Run(); return 0; }
        int repetitions = args.Length > 0 ? int.Parse(args[0], Inv) : 301;
        Console.WriteLine("helipol bench: thin-wire MoM engine");
        Console.WriteLine(string.Create(Inv, $"processors: {Environment.ProcessorCount}, SIMD width: {System.Numerics.Vector<double>.Count} doubles, repetitions: {repetitions}, load average before: {LoadAverage()}"));
        Console.WriteLine("Medians are the figures; minima show the cost undisturbed by other work on a shared machine.");
        Console.WriteLine();
        SingleFrequency(repetitions);
        FillScaling();
        SweepParallelism();
        SweepVersusNec2.Run();
        LoadingBench.Run();
        DesignBench.Run();
        return 0;
    }

    private static void SingleFrequency(int repetitions)
    {
        var (model, options) = BenchModels.DipoleWithFiveElements();
        var mesh = MeshedModel.Create(model, BenchModels.FrequencyHz, options);
        int n = mesh.UnknownCount;
        var z = new Complex[n * n];
        var rhs = new Complex[n];
        rhs[0] = 1;
        var x = new Complex[n];
        double f = BenchModels.FrequencyHz;

        var fill = MedianAndMinimum(repetitions, () => { }, () => MomSolver.FillMatrix(mesh, f, z, false));
        var handLu = MedianAndMinimum(repetitions, () => MomSolver.FillMatrix(mesh, f, z, false), () => DenseLuSolver.Instance.Solve(z, n, rhs, x));
        var libraryLu = MedianAndMinimum(repetitions, () => MomSolver.FillMatrix(mesh, f, z, false), () => MathNetLuSolver.Instance.Solve(z, n, rhs, x));
        var solve = MedianAndMinimum(repetitions, () => { }, () => MomSolver.Solve(mesh, f));
        var create = MedianAndMinimum(Math.Max(21, repetitions / 5), () => { }, () => MeshedModel.Create(model, f, options));

        // Allocation in the hot loop (fill + LU) and in a whole solve, after warm-up, on this thread.
        MomSolver.FillMatrix(mesh, f, z, false);
        DenseLuSolver.Instance.Solve(z, n, rhs, x);
        long before = GC.GetAllocatedBytesForCurrentThread();
        MomSolver.FillMatrix(mesh, f, z, false);
        DenseLuSolver.Instance.Solve(z, n, rhs, x);
        long hot = GC.GetAllocatedBytesForCurrentThread() - before;
        MomSolver.Solve(mesh, f);
        before = GC.GetAllocatedBytesForCurrentThread();
        MomSolver.Solve(mesh, f);
        long whole = GC.GetAllocatedBytesForCurrentThread() - before;

        Console.WriteLine(string.Create(Inv, $"One frequency, dipole + five 9-segment elements: {n} unknowns, {mesh.SegmentCount} segments, one core"));
        Console.WriteLine("| step | median ms | minimum ms |");
        Console.WriteLine("|---|---:|---:|");
        Console.WriteLine(string.Create(Inv, $"| matrix fill | {fill.Median:F3} | {fill.Minimum:F3} |"));
        Console.WriteLine(string.Create(Inv, $"| LU solve, hand-written (used) | {handLu.Median:F3} | {handLu.Minimum:F3} |"));
        Console.WriteLine(string.Create(Inv, $"| LU solve, MathNet (reference) | {libraryLu.Median:F3} | {libraryLu.Minimum:F3} |"));
        Console.WriteLine(string.Create(Inv, $"| MomSolver.Solve end to end (goal ≤ 2) | {solve.Median:F3} | {solve.Minimum:F3} |"));
        Console.WriteLine(string.Create(Inv, $"| MeshedModel.Create (once per geometry) | {create.Median:F3} | {create.Minimum:F3} |"));
        Console.WriteLine(string.Create(Inv, $"hand-written LU speed-up over MathNet (medians): {libraryLu.Median / handLu.Median:F2}x"));
        Console.WriteLine(string.Create(Inv, $"bytes allocated per frequency: fill + LU {hot}, whole solve with results {whole} (matrix buffer {16L * n * n} reused per thread)"));
        Console.WriteLine();
    }

    private static void FillScaling()
    {
        Console.WriteLine("Fill time against unknowns (same structure, denser dipole)");
        Console.WriteLine("| unknowns | fill median ms | fill minimum ms |");
        Console.WriteLine("|---:|---:|---:|");
        var logN = new List<double>();
        var logT = new List<double>();
        var logMin = new List<double>();
        foreach (int dipoleSegments in new[] { 12, 40, 90, 160, 260, 360 })
        {
            var (model, options) = BenchModels.DipoleWithFiveElements(dipoleSegments, 0.01e-3);
            var mesh = MeshedModel.Create(model, BenchModels.FrequencyHz, options);
            int n = mesh.UnknownCount;
            var z = new Complex[n * n];
            int reps = Math.Max(15, 6000 / n);
            var (t, least) = MedianAndMinimum(reps, () => { }, () => MomSolver.FillMatrix(mesh, BenchModels.FrequencyHz, z, false));
            Console.WriteLine(string.Create(Inv, $"| {n} | {t:F3} | {least:F3} |"));
            logN.Add(Math.Log(n));
            logT.Add(Math.Log(t));
            logMin.Add(Math.Log(least));
        }
        var (_, slope) = MathNet.Numerics.Fit.Line(logN.ToArray(), logT.ToArray());
        var (_, slopeMin) = MathNet.Numerics.Fit.Line(logN.ToArray(), logMin.ToArray());
        Console.WriteLine(string.Create(Inv, $"fitted exponent t ∝ N^p over N = {Math.Exp(logN[0]):F0}…{Math.Exp(logN[^1]):F0}: p = {slope:F2} on medians, {slopeMin:F2} on minima (goal ≤ 2; minima are the least disturbed by other load)"));
        Console.WriteLine();
    }

    private static void SweepParallelism()
    {
        var (model, options) = BenchModels.DipoleWithFiveElements();
        var mesh = MeshedModel.Create(model, BenchModels.FrequencyHz, options);
        var freqs = Enumerable.Range(0, 201).Select(i => 5.6e9 + 0.2e9 * i / 200).ToArray();
        MomSolver.Sweep(mesh, freqs, 2);
        var times = new Dictionary<int, double>();
        foreach (int workers in new[] { 1, 2 })
        {
            var runs = new List<double>();
            for (int r = 0; r < 5; r++)
            {
                var sw = Stopwatch.StartNew();
                MomSolver.Sweep(mesh, freqs, workers);
                runs.Add(sw.Elapsed.TotalMilliseconds);
            }
            runs.Sort();
            times[workers] = runs[runs.Count / 2];
        }
        Console.WriteLine(string.Create(Inv, $"201-point sweep, {mesh.UnknownCount} unknowns (median of 5)"));
        Console.WriteLine("| workers | ms | per frequency ms |");
        Console.WriteLine("|---:|---:|---:|");
        foreach (var (w, t) in times) Console.WriteLine(string.Create(Inv, $"| {w} | {t:F1} | {t / freqs.Length:F3} |"));
        Console.WriteLine(string.Create(Inv, $"speed-up 1 → 2 workers: {times[1] / times[2]:F2}x (ideal 2.00 on an idle 2-core machine)"));
        // Control: the same 1-vs-2 comparison on a plain arithmetic loop shows how much parallelism the
        // machine actually gives right now, independent of the engine.
        static void Spin(int _)
        {
            double a = 0;
            for (int i = 0; i < 1_000_000; i++) a += Math.Sqrt(i + a * 1e-9);
            GC.KeepAlive(a);
        }
        double Control(int workers)
        {
            var sw = Stopwatch.StartNew();
            Parallel.For(0, 40, new ParallelOptions { MaxDegreeOfParallelism = workers }, Spin);
            return sw.Elapsed.TotalMilliseconds;
        }
        Control(2);
        Console.WriteLine(string.Create(Inv, $"control, plain arithmetic loop: speed-up 1 → 2 workers {Control(1) / Control(2):F2}x (the machine's available parallelism at this moment)"));
    }

    private static double Median(int repetitions, Action timed) => Median(repetitions, () => { }, timed);

    private static string LoadAverage()
    {
        try { return File.ReadAllText("/proc/loadavg").Split(' ')[0]; }
        catch (IOException) { return "unknown"; }
        catch (UnauthorizedAccessException) { return "unknown"; }
    }

    /// <summary>Median wall time of <paramref name="timed"/>, ms, with an untimed <paramref name="setup"/> before each run.</summary>
    private static double Median(int repetitions, Action setup, Action timed) => MedianAndMinimum(repetitions, setup, timed).Median;

    private static (double Median, double Minimum) MedianAndMinimum(int repetitions, Action setup, Action timed)
    {
        for (int i = 0; i < 5; i++) { setup(); timed(); }
        var samples = new double[repetitions];
        for (int i = 0; i < repetitions; i++)
        {
            setup();
            long start = Stopwatch.GetTimestamp();
            timed();
            samples[i] = Stopwatch.GetElapsedTime(start).TotalMilliseconds;
        }
        Array.Sort(samples);
        return (samples[repetitions / 2], samples[0]);
    }
}
