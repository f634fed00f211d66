using System.Globalization;
using System.Text;
using YamlDotNet.RepresentationModel;

namespace Helipol.Design;

/// <summary>
/// Reads and writes calibration files (YAML): <c>material_set</c>, <c>loading_factor</c> (the factor
/// on the coating's added inductance), <c>fitted_by</c>, <c>design</c>, <c>source</c>. Only
/// <c>loading_factor</c> is required.
/// </summary>
public static class CalibrationFile
{
    /// <summary>The keys a calibration file may hold, in the order <see cref="Write"/> writes them.</summary>
    public static readonly IReadOnlyList<string> Keys = new[] { "material_set", "loading_factor", "fitted_by", "design", "source",
        "added_inductance_h_per_m", "residual", "factor_low", "factor_high", "data" };

    /// <param name="shownAs">the path as the design wrote it (kept in the result's source line)</param>
    /// <param name="shownInErrors">the path error lines start with, so a user can open it from where helipol ran</param>
    public static CoatingCalibration Read(string path, string? shownAs = null, string? shownInErrors = null)
    {
        string shown = shownInErrors ?? shownAs ?? path;
        var yaml = new YamlStream();
        try
        {
            using var reader = new StreamReader(path, Encoding.UTF8);
            yaml.Load(reader);
        }
        catch (YamlDotNet.Core.YamlException ex)
        {
            throw new CalibrationException($"{shown}:{ex.Start.Line}:{ex.Start.Column}: calibration: found text that is not YAML, allowed a mapping of calibration keys");
        }
        if (yaml.Documents.Count == 0 || yaml.Documents[0].RootNode is not YamlMappingNode root)
            throw new CalibrationException($"{shown}:1:1: calibration: found no mapping, allowed a mapping with loading_factor");
        // A misspelt key (loading_facter) would otherwise be ignored and the built-in factor used
        // without a word; every key must be one this reader knows.
        foreach (var key in root.Children.Keys)
            if (key is not YamlScalarNode { Value: { } name } || !Keys.Contains(name))
                throw new CalibrationException($"{shown}:{key.Start.Line}:{key.Start.Column}: calibration: found key '{(key as YamlScalarNode)?.Value ?? key.ToString()}', allowed {string.Join(", ", Keys)}");
        string? Text(string key) => root.Children.TryGetValue(new YamlScalarNode(key), out var n) && n is YamlScalarNode s ? s.Value : null;
        if (!root.Children.TryGetValue(new YamlScalarNode("loading_factor"), out var factorNode))
            throw new CalibrationException($"{shown}:{root.Start.Line}:{root.Start.Column}: loading_factor: found nothing, allowed a number ≥ 0");
        var written = (factorNode as YamlScalarNode)?.Value;
        if (!double.TryParse(written, NumberStyles.Float, CultureInfo.InvariantCulture, out var factor) || !double.IsFinite(factor) || factor < 0 || factor > 1000)
            throw new CalibrationException($"{shown}:{factorNode.Start.Line}:{factorNode.Start.Column}: loading_factor: found '{written}', allowed a number from 0 to 1000");
        return new CoatingCalibration(Text("material_set") ?? "unnamed", factor, Text("fitted_by") ?? "not stated", Text("design"),
            Text("source") ?? $"calibration file {shownAs ?? path}");
    }

    /// <summary>The file text: comments say what the number means; no timestamp, so the same fit gives the same bytes.</summary>
    public static string Write(CoatingCalibration c, MeasurementFitResult? fit = null, IReadOnlyList<(string File, string Sha256)>? data = null)
    {
        var s = new StringBuilder();
        s.Append("# helipol calibration: a factor on the added inductance of the dielectric around the elements\n");
        s.Append("# (field-solved cross-section, Design/Loading). Reference it from a design with\n");
        s.Append("# `calibration: <path to this file>`.\n");
        s.Append("material_set: ").Append(Quote(c.MaterialSet)).Append('\n');
        s.Append("loading_factor: ").Append(c.Factor.ToString("0.####", CultureInfo.InvariantCulture)).Append('\n');
        s.Append("fitted_by: ").Append(Quote(c.FittedBy)).Append('\n');
        if (c.FromDesign is { } d) s.Append("design: ").Append(Quote(d)).Append('\n');
        s.Append("source: ").Append(Quote(c.Source)).Append('\n');
        if (fit is not null)
        {
            // What the fit means for this design's elements, how well it fits, and how far it is pinned down.
            s.Append("added_inductance_h_per_m: ").Append(fit.AddedInductanceHPerM.ToString("0.####e0", CultureInfo.InvariantCulture)).Append('\n');
            s.Append("residual: ").Append(fit.Residual.ToString("0.#####", CultureInfo.InvariantCulture)).Append('\n');
            s.Append("factor_low: ").Append(fit.FactorLow.ToString("0.####", CultureInfo.InvariantCulture)).Append('\n');
            s.Append("factor_high: ").Append(fit.FactorHigh.ToString("0.####", CultureInfo.InvariantCulture)).Append('\n');
        }
        if (data is { Count: > 0 })
        {
            s.Append("data:\n");
            foreach (var (file, sha) in data) s.Append("  - { file: ").Append(Quote(file)).Append(", sha256: ").Append(Quote(sha)).Append(" }\n");
        }
        return s.ToString();
    }

    private static string Quote(string text) => "\"" + text.Replace("\\", "\\\\").Replace("\"", "\\\"") + "\"";
}

/// <summary>A calibration file that cannot be used; the message is one line with file:line:column.</summary>
public sealed class CalibrationException(string message) : Exception(message);
