using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using Phaseward.Checking;

namespace Phaseward.Rules.PassGatePaths;

/// <summary>
/// Where one split point of a PW2001 chain can be fixed in the source: the call that made the gate right after the
/// split, the one whose input a restoring stage would drive. Travels in <see cref="FindingPropertyKeys.SplitSites"/>,
/// one line per split point, written by <see cref="Format"/> and read back by <see cref="TryParse"/>: the rule and the
/// code fix share this one definition.
/// </summary>
public sealed class SplitSite
{
    private const char Separator = '|';
    private const int FieldCount = 8;

    public SplitSite(int position, int runFirst, int runCount, int siteGates, bool hasCallers, int start, int length, string path)
    {
        Position = position;
        RunFirst = runFirst;
        RunCount = runCount;
        SiteGates = siteGates;
        HasCallers = hasCallers;
        Start = start;
        Length = length;
        Path = path ?? throw new ArgumentNullException(nameof(path));
    }

    /// <summary>The chain position (1-based) of the gate right after the split.</summary>
    public int Position { get; }

    /// <summary>The first chain position of the consecutive run of this chain's gates made at the same call (a loop's iterations).</summary>
    public int RunFirst { get; }

    /// <summary>How many gates that run holds.</summary>
    public int RunCount { get; }

    /// <summary>How many pass devices the whole netlist makes at that call.</summary>
    public int SiteGates { get; }

    /// <summary>Whether any gate of the run was made through a helper method.</summary>
    public bool HasCallers { get; }

    /// <summary>The call's innermost source span start (-1 when unknown, as at run time).</summary>
    public int Start { get; }

    /// <summary>The call's source span length.</summary>
    public int Length { get; }

    /// <summary>The call's source file.</summary>
    public string Path { get; }

    /// <summary>One line: <c>position|runFirst|runCount|siteGates|hasCallers|start|length|path</c> (the path last, so it may hold '|').</summary>
    public string Format()
    {
        var text = new StringBuilder();
        AppendTo(text);
        return text.ToString();
    }

    /// <summary>The property value for several sites: one <see cref="Format"/> line each.</summary>
    public static string FormatAll(IEnumerable<SplitSite> sites)
    {
        if (sites is null) throw new ArgumentNullException(nameof(sites));
        var text = new StringBuilder();
        foreach (var site in sites)
        {
            if (text.Length > 0) text.Append('\n');
            site.AppendTo(text);
        }

        return text.ToString();
    }

    /// <summary>Reads one <see cref="Format"/> line; false for anything else.</summary>
    public static bool TryParse(string? line, out SplitSite? site)
    {
        site = null;
        if (line is null) return false;
        var parts = line.Split(new[] { Separator }, FieldCount);
        if (parts.Length != FieldCount) return false;
        var numbers = new int[4];
        for (var i = 0; i < numbers.Length; i++)
            if (!int.TryParse(parts[i], NumberStyles.None, CultureInfo.InvariantCulture, out numbers[i])) return false;
        if (parts[4] is not ("true" or "false")
            || !int.TryParse(parts[5], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var start)
            || !int.TryParse(parts[6], NumberStyles.None, CultureInfo.InvariantCulture, out var length))
            return false;
        site = new SplitSite(numbers[0], numbers[1], numbers[2], numbers[3], parts[4] == "true", start, length, parts[7]);
        return true;
    }

    /// <summary>Reads a <see cref="FormatAll"/> value; false if any line does not parse.</summary>
    public static bool TryParseAll(string? text, out IReadOnlyList<SplitSite> sites)
    {
        var list = new List<SplitSite>();
        sites = list;
        if (string.IsNullOrEmpty(text)) return false;
        foreach (var line in text!.Split('\n'))
        {
            if (!TryParse(line, out var site)) return false;
            list.Add(site!);
        }

        return true;
    }

    public override string ToString() => Format();

    private void AppendTo(StringBuilder text)
        => text.Append(Invariant(Position)).Append(Separator)
            .Append(Invariant(RunFirst)).Append(Separator)
            .Append(Invariant(RunCount)).Append(Separator)
            .Append(Invariant(SiteGates)).Append(Separator)
            .Append(FindingPropertyValues.Flag(HasCallers)).Append(Separator)
            .Append(Invariant(Start)).Append(Separator)
            .Append(Invariant(Length)).Append(Separator)
            .Append(Path);

    private static string Invariant(int value) => value.ToString(CultureInfo.InvariantCulture);
}
