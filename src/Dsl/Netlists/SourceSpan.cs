using System;
using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>
/// Where a device, clock or port was written. At run time only the file and line of the call are known; at
/// compile time the analyzer also records the column, the character span and the chain of call sites that led
/// there through the design's helper methods.
/// </summary>
public sealed class SourceSpan : IEquatable<SourceSpan>
{
    private static readonly IReadOnlyList<SourceSpan> NoCallers = Array.Empty<SourceSpan>();

    /// <summary>A place in a source file: 1-based <paramref name="line"/> and <paramref name="column"/>, the character range (<paramref name="start"/>, <paramref name="length"/>; -1 when unknown) and the helper calls that led there.</summary>
    public SourceSpan(string path, int line, int column = 0, int start = -1, int length = 0, IReadOnlyList<SourceSpan>? callers = null)
    {
        Path = path ?? string.Empty;
        Line = line;
        Column = column;
        Start = start;
        Length = length;
        Callers = callers ?? NoCallers;
    }

    /// <summary>No known place (a design built outside a source file).</summary>
    public static SourceSpan Unknown { get; } = new(string.Empty, 0);

    /// <summary>The source file ("" when unknown).</summary>
    public string Path { get; }

    /// <summary>1-based line (0 when unknown).</summary>
    public int Line { get; }

    /// <summary>1-based column (0 when unknown, as at run time).</summary>
    public int Column { get; }

    /// <summary>0-based character offset in the file (-1 when unknown).</summary>
    public int Start { get; }

    /// <summary>The length of the character range (0 when unknown).</summary>
    public int Length { get; }

    /// <summary>The call sites that led here, outermost first (the call in <c>Describe</c> comes first).</summary>
    public IReadOnlyList<SourceSpan> Callers { get; }

    /// <summary>True when the span names a line.</summary>
    public bool IsKnown => Line > 0;

    /// <summary>True when <paramref name="other"/> names the same file, line, column and range (the callers are not compared).</summary>
    public bool Equals(SourceSpan? other)
        => other is not null && Path == other.Path && Line == other.Line && Column == other.Column && Start == other.Start && Length == other.Length;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as SourceSpan);

    /// <inheritdoc/>
    public override int GetHashCode() => (Path.GetHashCode() * 397) ^ (Line * 31) ^ Start;

    /// <inheritdoc/>
    public override string ToString()
        => !IsKnown ? "(unknown location)" : Column > 0 ? $"{Path}({Line},{Column})" : $"{Path}({Line})";
}
