using System;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// An exception the design's code throws (or a library member throws for it) while inside a try statement, carried to
/// the design's own catch clauses. The exception object is a real .NET exception (library exception types are pure),
/// or the interpreted object of the design's own exception class.
/// </summary>
internal sealed class DesignException : Exception
{
    public DesignException(object thrown, SyntaxNode site)
        : base("The design's code threw an exception.")
    {
        Thrown = thrown;
        Site = site;
    }

    public object Thrown { get; }

    public SyntaxNode Site { get; }

    /// <summary>Whether the catch clause that takes it has been sought yet (the first pass, filters included).</summary>
    public bool HandlerSought { get; set; }

    /// <summary>The catch clause that takes it and the frame of its try statement; null when none does.</summary>
    public (ICatchClauseOperation Clause, Frame Frame)? Handler { get; set; }

    /// <summary>The message C# would show for the thrown exception.</summary>
    public string Describe() => Thrown is Exception e ? e.GetType().Name + ": " + e.Message : Thrown.ToString() ?? "an exception";
}
