using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;

namespace Phaseward.Tests.Storage;

/// <summary>
/// Reads tests/reference/ngspice/retention.csv: ngspice-39 transient results for a precharged capacitor drained by an
/// ideal current source or by a resistor (netlists and the command that made them: tests/reference/ngspice/README.md).
/// </summary>
internal static class RetentionReference
{
    public sealed record Row(string Case, double C, double IOrR, double V0, double DeltaV, double T);

    public static IReadOnlyList<Row> Rows { get; } = Load();

    private static IReadOnlyList<Row> Load()
    {
        var lines = File.ReadAllLines(Locate());
        Assert.Equal("case,c_farad,i_ampere_or_r_ohm,v0,delta_v,t_seconds", lines[0]);
        return lines.Skip(1).Where(l => l.Length > 0).Select(l =>
        {
            var f = l.Split(',');
            double D(int i) => double.Parse(f[i], NumberStyles.Float, CultureInfo.InvariantCulture);
            return new Row(f[0], D(1), D(2), D(3), D(4), D(5));
        }).ToArray();
    }

    private static string Locate()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "tests", "reference", "ngspice", "retention.csv");
            if (File.Exists(candidate)) return candidate;
        }

        throw new FileNotFoundException("tests/reference/ngspice/retention.csv not found above " + AppContext.BaseDirectory);
    }
}
