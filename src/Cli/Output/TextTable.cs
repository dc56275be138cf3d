using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;

namespace Phaseward.Cli.Output;

/// <summary>A plain-text table with aligned columns; columns whose header starts with '>' are right-aligned (figures).</summary>
internal sealed class TextTable
{
    private readonly string[] headers;
    private readonly bool[] right;
    private readonly List<string[]> rows = new();

    public TextTable(params string[] headers)
    {
        right = headers.Select(h => h.StartsWith('>')).ToArray();
        this.headers = headers.Select(h => h.TrimStart('>')).ToArray();
    }

    public int Count => rows.Count;

    public void Add(params object?[] cells)
    {
        if (cells.Length != headers.Length)
            throw new ArgumentException($"A row needs {headers.Length} cells (was {cells.Length}).", nameof(cells));
        rows.Add(cells.Select(c => c?.ToString() ?? string.Empty).ToArray());
    }

    public void Write(TextWriter writer, string indent = "  ")
    {
        var widths = headers.Select((h, i) => Math.Max(h.Length, rows.Count == 0 ? 0 : rows.Max(r => r[i].Length))).ToArray();
        WriteRow(writer, indent, headers, widths);
        writer.WriteLine(indent + string.Join("  ", widths.Select(w => new string('-', w))).TrimEnd());
        foreach (var row in rows)
            WriteRow(writer, indent, row, widths);
    }

    private void WriteRow(TextWriter writer, string indent, string[] cells, int[] widths)
    {
        var parts = cells.Select((c, i) => right[i] ? c.PadLeft(widths[i]) : c.PadRight(widths[i]));
        writer.WriteLine((indent + string.Join("  ", parts)).TrimEnd());
    }
}
