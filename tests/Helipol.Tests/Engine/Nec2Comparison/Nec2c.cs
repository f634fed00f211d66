using Helipol.Tests.Emit;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>
/// Runs Debian's nec2c (a C translation of the public-domain NEC-2 method-of-moments code) on a deck
/// in a scratch folder and reads its output. On CI (CI=true) a missing nec2c fails the test;
/// elsewhere the test is skipped with the reason.
/// </summary>
internal static class Nec2c
{
    public const string Program = "/usr/bin/nec2c";

    public static void Require()
    {
        if (File.Exists(Program)) return;
        const string why = "nec2c is not installed (bash .ci/deps.sh nec2c)";
        if (string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase))
            Assert.Fail("outside solver missing on CI: " + why);
        Skip.If(true, why);
    }

    /// <summary>Writes <paramref name="deck"/>, runs <c>nec2c -i deck.nec -o out.txt</c> and parses the output.</summary>
    public static Nec2Output Run(string deck)
    {
        Require();
        var dir = OutsideReaders.TempFolder();
        try
        {
            var input = Path.Combine(dir, "deck.nec");
            var output = Path.Combine(dir, "out.txt");
            File.WriteAllText(input, deck);
            var (code, _) = OutsideReaders.Run(Program, ["-i", input, "-o", output], out var stderr);
            Assert.True(code == 0 && File.Exists(output), $"nec2c failed (exit {code}): {stderr}\n{deck}");
            return Nec2Output.Parse(File.ReadAllText(output));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
