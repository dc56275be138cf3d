using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text.RegularExpressions;

namespace Phaseward.Reproducers;

/// <summary>
/// The <c>.meas</c> results in ngspice's batch output (<c>name = value</c>, possibly followed by <c>targ=</c> and
/// <c>trig=</c>), and the names of the measurements ngspice reports as failed. ngspice exits 0 even when a
/// measurement fails, so a caller must look for its value here.
/// </summary>
public sealed class MeasuredValues
{
    private static readonly Regex ValueLine = new(@"^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=\s*([-+0-9.eE]+)(\s|$)", RegexOptions.Multiline);
    private static readonly Regex FailedLine = new(@"^\s*\.meas(?:ure)?\s+\w+\s+([A-Za-z_][A-Za-z0-9_]*)\b.*failed!", RegexOptions.Multiline | RegexOptions.IgnoreCase);

    private MeasuredValues(IReadOnlyDictionary<string, double> values, IReadOnlyList<string> failed)
    {
        Values = values;
        Failed = failed;
    }

    /// <summary>Measured values by (lower-case) name.</summary>
    public IReadOnlyDictionary<string, double> Values { get; }

    /// <summary>Measurements ngspice could not make (lower-case names).</summary>
    public IReadOnlyList<string> Failed { get; }

    /// <summary>Reads the <c>.meas</c> results (and the failed measurements) from ngspice's batch output.</summary>
    public static MeasuredValues Parse(string ngspiceOutput)
    {
        if (ngspiceOutput is null) throw new ArgumentNullException(nameof(ngspiceOutput));
        var values = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        var failed = new List<string>();
        var inMeasurements = false;
        foreach (var raw in ngspiceOutput.Split('\n'))
        {
            var line = raw.TrimEnd('\r');
            if (line.IndexOf("Measurements for", StringComparison.OrdinalIgnoreCase) >= 0) { inMeasurements = true; continue; }
            if (line.StartsWith("Total analysis time", StringComparison.OrdinalIgnoreCase)) inMeasurements = false;
            if (!inMeasurements) continue;
            var fail = FailedLine.Match(line);
            if (fail.Success) { failed.Add(fail.Groups[1].Value.ToLowerInvariant()); continue; }
            var match = ValueLine.Match(line);
            if (match.Success && double.TryParse(match.Groups[2].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var value))
                values[match.Groups[1].Value.ToLowerInvariant()] = value;
        }

        return new MeasuredValues(values, failed);
    }

    /// <summary>The measured value of <paramref name="name"/>, or null when ngspice did not print one.</summary>
    public double? Find(string name) => Values.TryGetValue(name, out var value) ? value : null;
}
