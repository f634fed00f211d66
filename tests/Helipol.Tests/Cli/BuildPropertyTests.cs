using System.Globalization;
using System.Text;
using CsCheck;
using Xunit.Abstractions;
using Helipol.Tests.Emit;

namespace Helipol.Tests.Cli;

/// <summary>
/// Property check (CsCheck) of a full <c>build</c> on random valid designs across 0.3–10 GHz:
/// dipole and monopole whips, 3–8 elements, every wire, former and wrap material. Sizes scale
/// with the wavelength around the builders' 5.8 GHz proportions (common practice, no source);
/// the search is kept coarse so each build takes about a second. Whatever the design, the build
/// exits 0 or refuses it with one line and exit 2; it never crashes. Every STL it writes is a
/// closed two-manifold by our own edge count and by admesh (nothing repaired, one part); every
/// DXF loads and audits clean in ezdxf; design.json and report.md carry no NaN or infinity.
/// </summary>
public class BuildPropertyTests(ITestOutputHelper log)
{
    private static readonly string[] Wires = ["pec", "copper", "brass", "steel", "stainless"];
    private static readonly string[] Formers = ["air", "eps-foam", "xps-foam", "pla", "petg"];
    private static readonly string[] Wraps = ["none", "pvc-tape", "packing-tape", "masking-tape"];

    private sealed record Params(double CenterGHz, bool Monopole, int Elements, int Wire, int Former, int Wrap, bool Rhcp, int Winding,
        double WireFraction, double OuterFraction, double HeightFraction);

    /// <summary>A share of [a, b] in 1000 steps (integer draws spread evenly; CsCheck's doubles crowd round values).</summary>
    private static Gen<double> Between(double a, double b) => Gen.Int[0, 1000].Select(i => a + (b - a) * i / 1000.0);

    private static readonly Gen<Params> Designs =
        Gen.Select(Between(Math.Log(0.3), Math.Log(10)), Gen.Bool, Gen.Int[3, 8], Gen.Int[0, 4], Gen.Int[0, 4], Gen.Int[0, 3], Gen.Bool, Gen.Int[0, 2])
            .SelectMany(t => Gen.Select(Between(0.004, 0.012), Between(0.4, 0.6), Between(0.35, 0.6))
                .Select(u => new Params(Math.Exp(t.Item1), t.Item2, t.Item3, t.Item4, t.Item5, t.Item6, t.Item7, t.Item8, u.Item1, u.Item2, u.Item3)));

    private static string Mm(double mm) => mm.ToString("0.###", CultureInfo.InvariantCulture) + " mm";

    /// <summary>A design file from the parameters; every size a share of the wavelength λ.</summary>
    private static string Yaml(Params p)
    {
        double lambdaMm = 299_792_458.0 / (p.CenterGHz * 1e9) * 1e3;
        double whipLength = (p.Monopole ? 0.24 : 0.47) * lambdaMm;
        double whipDiameter = Math.Clamp(0.01 * lambdaMm, 0.3, 8);
        double cover = whipDiameter * 2;
        double wire = Math.Clamp(p.WireFraction * lambdaMm, 0.2, 5);
        double bore = cover + 0.4;
        double outer = Math.Max(p.OuterFraction * lambdaMm, bore + 6 * wire);
        double height = p.HeightFraction * lambdaMm;
        double board = Math.Max(300, Math.Ceiling(outer * 1.2 + 20));
        var y = new StringBuilder();
        y.AppendLine("name: random-design");
        y.AppendLine(FormattableString.Invariant($"band: {{ center: {p.CenterGHz * 1e3:0.###} MHz }}"));
        y.AppendLine($"whip: {{ kind: {(p.Monopole ? "monopole" : "dipole")}, length: {Mm(whipLength)}, diameter: {Mm(whipDiameter)}, cover_diameter: {Mm(cover)} }}");
        y.AppendLine("polarizer:");
        y.AppendLine($"  sense: {(p.Rhcp ? "rhcp" : "lhcp")}");
        y.AppendLine($"  winding: {new[] { "auto", "left", "right" }[p.Winding]}");
        y.AppendLine(FormattableString.Invariant($"  elements: {p.Elements}"));
        y.AppendLine($"  centre_height: {Mm(p.Monopole ? height / 2 + wire : 0)}");
        y.AppendLine($"  wire: {{ diameter: {Mm(wire)}, material: {Wires[p.Wire]} }}");
        y.AppendLine($"  former: {{ material: {Formers[p.Former]}, outer_diameter: {Mm(outer)}, bore: {Mm(bore)}, height: {Mm(height)} }}");
        y.AppendLine(p.Wrap == 0 ? "  wrap: none" : $"  wrap: {{ material: {Wraps[p.Wrap]}, layers: 1 }}");
        y.AppendLine($"fabrication: {{ rings: 1, dpi: 72, board: {{ width: {Mm(board)}, height: {Mm(board)}, thickness: {Mm(Math.Clamp(height, 1, 200))} }} }}");
        y.AppendLine("solve: { frequencies: 1, elevation_step: 15 deg, azimuth_step: 30 deg, search: { grid: 3 }, sweep: { points: 5 } }");
        y.AppendLine("tolerance: { builds: 2 }");
        return y.ToString();
    }

    [SkippableFact]
    public void RandomValidDesignsBuildCleanlyIntoReadableFiles()
    {
        OutsideReaders.RequireAdmesh();
        OutsideReaders.RequireEzdxf();
        var folder = TestPaths.NewTempFolder();
        try
        {
            int built = 0, refused = 0, index = 0;
            var dxfs = new List<string>();
            Designs.Sample(p =>
            {
                var run = Path.Combine(folder, $"run{index++}");
                Directory.CreateDirectory(run);
                var design = Path.Combine(run, "random-design.yaml");
                File.WriteAllText(design, Yaml(p));
                var result = CliRun.Of("build", design, "-o", Path.Combine(run, "out"));
                Assert.DoesNotContain("   at ", result.Error);
                if (result.ExitCode == 2)
                {
                    // A clean refusal: one line, nothing written.
                    Assert.Single(result.Error.TrimEnd('\n').Split('\n'));
                    Assert.False(Directory.Exists(Path.Combine(run, "out")), "a refused build wrote files");
                    refused++;
                    log.WriteLine("refused: " + result.FirstErrorLine);
                    return;
                }
                Assert.True(result.ExitCode == 0, $"{p}: exit {result.ExitCode}: {result.Error}");
                built++;
                log.WriteLine($"built: {p}");
                var outDir = Path.Combine(run, "out", "random-design");
                foreach (var text in new[] { "design.json", "report.md" })
                    Assert.DoesNotMatch(@"\bNaN\b|\bInfinity\b|∞", File.ReadAllText(Path.Combine(outDir, text)));
                foreach (var stl in new[] { "former.stl", "jig.stl" })
                {
                    var path = Path.Combine(outDir, stl);
                    StlEdges.AssertClosedTwoManifold(File.ReadAllBytes(path), $"{p} {stl}");
                    AssertAdmeshRepairsNothing(path);
                }
                dxfs.AddRange(Directory.GetFiles(outDir, "*.dxf"));
            }, iter: 8, threads: 1);
            Assert.True(built >= refused, $"only {built} of {built + refused} random valid designs built; the property barely exercises build");
            AssertEzdxfReadsClean(dxfs);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    /// <summary>admesh (Debian) with exact matching: a watertight solid needs no repair and is one part.</summary>
    private static void AssertAdmeshRepairsNothing(string path)
    {
        var (code, stdout) = OutsideReaders.Run(OutsideReaders.Admesh, [path], out var err);
        Assert.True(code == 0, "admesh failed: " + err);
        foreach (var key in new[] { "Edges fixed", "Facets removed", "Facets added", "Backwards edges", "Degenerate facets" })
            Assert.Matches($@"{key}\s*:\s*0\b", stdout);
        Assert.Matches(@"Number of parts\s*:\s*1\b", stdout);
    }

    /// <summary>One python call for every DXF: each must load and its audit find no error.</summary>
    private static void AssertEzdxfReadsClean(IReadOnlyList<string> paths)
    {
        Assert.NotEmpty(paths);
        const string script = """
import sys, ezdxf
for path in sys.argv[1:]:
    doc = ezdxf.readfile(path)
    auditor = doc.audit()
    print(len(auditor.errors), len(list(doc.modelspace())), path)
""";
        var (code, stdout) = OutsideReaders.Run(OutsideReaders.SystemPython, ["-c", script, .. paths], out var err);
        Assert.True(code == 0, "ezdxf could not read a file: " + err);
        var lines = stdout.TrimEnd('\n').Split('\n');
        Assert.Equal(paths.Count, lines.Length);
        foreach (var line in lines)
        {
            var parts = line.Split(' ', 3);
            Assert.True(parts[0] == "0", "ezdxf audit errors: " + line);
            Assert.True(int.Parse(parts[1], CultureInfo.InvariantCulture) > 0, "empty modelspace: " + line);
        }
    }
}
