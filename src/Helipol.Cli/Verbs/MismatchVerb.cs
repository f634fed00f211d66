using System.CommandLine;
using System.Globalization;
using Helipol.Design.Mismatch;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol mismatch A B</c>: polarization loss between two antennas, e.g. <c>rhcp:1.5dB linear</c>.
/// When neither tilt is given (no <c>@…deg</c>), the loss depends on how the two are turned about
/// the link axis, so the range over every relative tilt is shown too.
/// </summary>
public static class MismatchVerb
{
    public static Command Create(CliConsole console)
    {
        var a = new Argument<string>("A") { Description = "first antenna: rhcp | lhcp | linear, with :ARdB and @TILTdeg, e.g. rhcp:1.5dB or linear@30deg" };
        var b = new Argument<string>("B") { Description = "second antenna, same notation" };
        var command = new Command("mismatch", "Polarization loss between two antennas from sense, axial ratio and tilt.") { a, b };
        command.SetAction(parse =>
        {
            string ta = parse.GetValue(a)!, tb = parse.GetValue(b)!;
            PolarizationState sa, sb;
            var at = "A";
            try
            {
                sa = PolarizationState.Parse(ta);
                at = "B";
                sb = PolarizationState.Parse(tb);
            }
            catch (FormatException ex)
            {
                console.Error.WriteLine($"helipol mismatch: {at}: {ex.Message}");
                return ExitCodes.BadInput;
            }
            var inv = CultureInfo.InvariantCulture;
            double f = PolarizationMismatch.LossFactor(sa, sb);
            console.Out.WriteLine(string.Create(inv, $"{sa} against {sb}: loss factor {f:0.####} ({Db(f)})"));
            if (!ta.Contains('@') && !tb.Contains('@'))
            {
                var (best, worst) = PolarizationMismatch.LossFactorRangeOverTilt(sa, sb);
                console.Out.WriteLine(string.Create(inv, $"over every relative tilt: {best:0.####} ({Db(best)}) at best, {worst:0.####} ({Db(worst)}) at worst"));
            }
            return ExitCodes.Ok;
        });
        return command;
    }

    private static string Db(double factor)
    {
        if (factor <= 0) return "total loss";
        double db = -10 * Math.Log10(factor);
        if (db == 0) db = 0; // never print "-0.00"
        return string.Create(CultureInfo.InvariantCulture, $"{db:0.00} dB loss");
    }
}
