using System.CommandLine;
using System.Text.RegularExpressions;
using Helipol.Cli;

namespace Helipol.Tests.Cli;

/// <summary>
/// Malformed command lines each get one line in the project's form (README "Verbs": `helipol VERB:
/// --option: found ..., allowed ...`, or `helipol: found unknown verb ...`) and exit 2, and never
/// a .NET type name. The file names need not exist: a command line is refused before any file is read.
/// </summary>
public class CommandLineErrorTests
{
    private const string Verbs = "check, solve, build, new, schema, analyze, sweep, tolerance, calibrate or mismatch";

    public static TheoryData<string, string> Malformed => new()
    {
        // verbs
        { "", $"helipol: found no verb, allowed {Verbs}" },
        { "biuld x.yaml", "helipol: found unknown verb 'biuld' (did you mean 'build'?)" },
        { "BUILD x.yaml", "helipol: found unknown verb 'BUILD' (did you mean 'build'?)" },
        { "sweeep x.yaml", "helipol: found unknown verb 'sweeep' (did you mean 'sweep'?)" },
        { "frobnicate", $"helipol: found unknown verb 'frobnicate', allowed {Verbs}" },
        { "--bogus", $"helipol: found unknown option '--bogus', allowed a verb ({Verbs}), --help or --version" },
        { "--verison", "helipol: found unknown option '--verison' (did you mean '--version'?)" },
        // unknown options, with and without a near one
        { "sweep x.yaml --pts 5", "helipol sweep: found unknown option '--pts' (did you mean '--points'?)" },
        { "sweep --pts 5 x.yaml", "helipol sweep: found unknown option '--pts' (did you mean '--points'?)" },
        { "solve x.yaml --mpa map.png", "helipol solve: found unknown option '--mpa' (did you mean '--map'?)" },
        { "build x.yaml --ouptut dir", "helipol build: found unknown option '--ouptut' (did you mean '--output'?)" },
        { "tolerance x.yaml --build=5", "helipol tolerance: found unknown option '--build' (did you mean '--builds'?)" },
        { "sweep -x", "helipol sweep: found unknown option '-x', allowed --points, --json or --help" },
        // bad numbers
        { "sweep x.yaml --points abc", "helipol sweep: --points: found 'abc', allowed a whole number" },
        { "sweep x.yaml --points=abc", "helipol sweep: --points: found 'abc', allowed a whole number" },
        { "sweep x.yaml --points 1.5", "helipol sweep: --points: found '1.5', allowed a whole number" },
        { "tolerance x.yaml --builds 10x", "helipol tolerance: --builds: found '10x', allowed a whole number" },
        { "analyze x.yaml --from 1GHz --to 2GHz --points many", "helipol analyze: --points: found 'many', allowed a whole number" },
        // unknown choice words
        { "new foo --whip yagi --center 1GHz", "helipol new: --whip: found 'yagi', allowed dipole or monopole" },
        { "mismatch circular rhcp", "helipol mismatch: A: found 'circular', allowed rhcp, lhcp or linear, with an optional :ARdB and @TILTdeg (e.g. rhcp:1.5dB@30deg)" },
        { "mismatch rhcp rhcp:1.5", "helipol mismatch: B: found 'rhcp:1.5', allowed an axial ratio as a finite number with its unit, e.g. 1.5dB" },
        { "mismatch rhcp -1", "helipol mismatch: B: found '-1', allowed rhcp, lhcp or linear, with an optional :ARdB and @TILTdeg (e.g. rhcp:1.5dB@30deg)" },
        { "mismatch linear:3dB rhcp", "helipol mismatch: A: found 'linear:3dB', allowed linear or linear@TILTdeg (a linear antenna takes no axial ratio)" },
        // missing option values, repeated options
        { "schema -o", "helipol schema: --output: found no value, allowed file to write instead of stdout (e.g. designs/helipol.schema.json)" },
        { "solve x.yaml --map", "helipol solve: --map: found no value, allowed PNG file to write the search's objective map to, as a heat map" },
        { "analyze x.yaml --points", "helipol analyze: --points: found no value, allowed a whole number" },
        { "analyze x.yaml --elevation -10deg --freq", "helipol analyze: --freq: found no value, allowed one frequency, e.g. 5.8GHz" },
        { "build x.yaml -o", "helipol build: --output: found no value, allowed folder that receives one sub-folder per design" },
        { "new x --center 1GHz --whip", "helipol new: --whip: found no value, allowed dipole or monopole" },
        { "calibrate x.yaml --best-at", "helipol calibrate: --best-at: found no value, allowed frequency where the build measured its best axial ratio, e.g. 5.65GHz" },
        { "sweep x.yaml --points 5 --points 6", "helipol sweep: --points: found 2 values ('5', '6'), allowed one value" },
        // missing required options
        { "calibrate x.yaml", "helipol calibrate: found no measurement, allowed either --best-at or any of --s1p, --spin, --contrast" },
        { "new x", "helipol new: --center: found nothing, allowed centre frequency with its unit, e.g. 2.45GHz (required)" },
        // missing arguments
        { "sweep", "helipol sweep: FILE: found nothing, allowed design file (.yaml)" },
        { "analyze --json", "helipol analyze: FILE: found nothing, allowed design file (.yaml) or a design.json written by build or solve" },
        { "build", "helipol build: FILE: found nothing, allowed design files (.yaml)" },
        { "check", "helipol check: FILE: found nothing, allowed design files (.yaml)" },
        { "mismatch rhcp", "helipol mismatch: B: found nothing, allowed second antenna, same notation" },
        // too many arguments
        { "sweep x.yaml extra", "helipol sweep: found an extra argument 'extra', allowed only FILE" },
        { "sweep x.yaml --json maybe", "helipol sweep: found an extra argument 'maybe', allowed only FILE" },
        { "sweep x.yaml -- -x", "helipol sweep: found an extra argument '-x', allowed only FILE" },
        { "schema extra", "helipol schema: found an extra argument 'extra', allowed no arguments" },
        { "mismatch a b c", "helipol mismatch: found an extra argument 'c', allowed only A and B" },
        // no response files: a word starting with '@' is a file name like any other
        { "@args.txt", $"helipol: found unknown verb '@args.txt', allowed {Verbs}" },
    };

    private static string[] Split(string line) => line.Split(' ', StringSplitOptions.RemoveEmptyEntries);

    [Theory]
    [MemberData(nameof(Malformed))]
    public void EachMalformedLineGetsOneLineAndExit2(string commandLine, string expected)
    {
        var run = CliRun.Of(Split(commandLine));
        Assert.Equal(ExitCodes.BadInput, run.ExitCode);
        Assert.Equal(expected + "\n", run.Error);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void TableIsAtLeastTwentyFiveLines() => Assert.True(Malformed.Count >= 25);

    // A .NET type name as the parser would print it: a namespace, a generic arity mark, a CLR type keyword.
    private static readonly Regex TypeName = new(@"System\.|`\d|\b(Int32|Int64|Double|Boolean|String|Nullable)\b", RegexOptions.Compiled);

    [Fact]
    public void NoOutputNamesADotNetType()
    {
        foreach (var row in Malformed)
        {
            var run = CliRun.Of(Split((string)row[0]));
            Assert.DoesNotMatch(TypeName, run.Out);
            Assert.DoesNotMatch(TypeName, run.Error);
        }
    }

    [Fact]
    public void ChildProcessExitsTwoWithTheSameLine()
    {
        var run = CliProcess.Run(new Dictionary<string, string>(), null, "sweep", "x.yaml", "--points", "abc");
        Assert.Equal(2, run.ExitCode);
        Assert.Equal("helipol sweep: --points: found 'abc', allowed a whole number", run.Error.TrimEnd('\n'));
    }

    [Fact]
    public void HelpStillWinsOverOtherWords()
    {
        var run = CliRun.Of("sweep", "--pts", "--help");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Usage:", run.Out);
    }

    [Fact]
    public void VersionIsThePackageVersion()
    {
        // The version written once in Directory.Build.props is the package's and the program's.
        var props = File.ReadAllText(Path.Combine(TestPaths.RepositoryRoot, "Directory.Build.props"));
        var version = Regex.Match(props, "<Version>([^<]+)</Version>").Groups[1].Value;
        var run = CliRun.Of("--version");
        Assert.Equal(0, run.ExitCode);
        Assert.Equal(version + "\n", run.Out);
    }

    // Options added to a verb later are covered with no code in CommandLineErrors: a made-up verb
    // with kinds of option the real verbs do not have yet.
    private enum Spin { Left, Right }

    private static string? Refusal(params string[] args)
    {
        var count = new Option<int>("--count");
        count.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<int>() < 1) r.AddError($"found {r.GetValueOrDefault<int>()}, allowed 1 or more");
        });
        var verb = new Command("demo") { new Option<double>("--ratio"), new Option<Spin>("--spin"), count, new Option<bool>("--strict") };
        var root = new RootCommand { verb };
        return CommandLineErrors.Describe(root, root.Parse(args));
    }

    [Theory]
    [InlineData("demo --ratio abc", "helipol demo: --ratio: found 'abc', allowed a number")]
    [InlineData("demo --spin up", "helipol demo: --spin: found 'up', allowed Left or Right")]
    [InlineData("demo --count 0", "helipol demo: --count: found 0, allowed 1 or more")]
    [InlineData("demo --stirct", "helipol demo: found unknown option '--stirct' (did you mean '--strict'?)")]
    [InlineData("demo --ratio 0.5 --spin left --count 2 --strict", null)]
    public void OptionsAddedLaterAreCovered(string commandLine, string? expected) => Assert.Equal(expected, Refusal(Split(commandLine)));

    [Theory]
    // Classic edit-distance pairs (from memory): kitten/sitting 3; a transposition costs one.
    [InlineData("kitten", "sitting", 3)]
    [InlineData("biuld", "build", 1)]
    [InlineData("pts", "points", 3)]
    [InlineData("", "abc", 3)]
    public void EditDistance(string a, string b, int expected) => Assert.Equal(expected, Suggestion.Distance(a, b));
}
