using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;

namespace Phaseward.Tests.Reference;

/// <summary>
/// The ngspice-39 values committed in tests/reference/ngspice (netlists, regenerate.sh and README there), copied
/// beside the test assembly by the project file.
/// </summary>
internal static class NgspiceReference
{
    public sealed record LadderRow(int Sections, double Ohms, double Farads, double T50Seconds);

    public sealed record TreeRow(string Tree, string Leaf, double T50Seconds);

    public static IReadOnlyList<LadderRow> Ladders { get; } = Read("rc_ladder_t50.csv", 4)
        .Select(f => new LadderRow(int.Parse(f[0], CultureInfo.InvariantCulture), Number(f[1]), Number(f[2]), Number(f[3])))
        .ToArray();

    public static IReadOnlyList<TreeRow> Trees { get; } = Read("rc_tree_t50.csv", 3)
        .Select(f => new TreeRow(f[0], f[1], Number(f[2])))
        .ToArray();

    public sealed record RestoredChainRow(int Gates, int Spacing, double Ohms, double Farads, double StageDelaySeconds, double T50Seconds);

    public static IReadOnlyList<RestoredChainRow> RestoredChains { get; } = Read("restored_chain_t50.csv", 6)
        .Select(f => new RestoredChainRow(int.Parse(f[0], CultureInfo.InvariantCulture), int.Parse(f[1], CultureInfo.InvariantCulture),
            Number(f[2]), Number(f[3]), Number(f[4]), Number(f[5])))
        .ToArray();

    public static double TreeT50(string tree, string leaf)
        => Trees.Single(r => r.Tree == tree && r.Leaf == leaf).T50Seconds;

    private static IEnumerable<string[]> Read(string file, int columns)
    {
        var path = Path.Combine(AppContext.BaseDirectory, "reference", "ngspice", file);
        if (!File.Exists(path))
            throw new FileNotFoundException($"Reference file '{file}' was not copied beside the tests (looked for {path}).", path);
        var lines = File.ReadAllLines(path).Where(l => l.Trim().Length > 0).ToArray();
        foreach (var line in lines.Skip(1))
        {
            var fields = line.Split(',');
            if (fields.Length != columns)
                throw new InvalidDataException($"'{file}': expected {columns} columns, got {fields.Length} in \"{line}\".");
            yield return fields;
        }
    }

    private static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}
