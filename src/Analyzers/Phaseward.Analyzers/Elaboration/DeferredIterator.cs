using System;
using System.Collections;
using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// A call of the design's iterator that no foreach consumes straight away (<c>var bits = Bits();</c>, an argument to
/// LINQ): as in C#, none of its body runs at the call. Each enumeration runs it from the start with the call's
/// arguments, and it reads the state of that moment (C# specification, §15.15, iterators). A foreach over it streams
/// each value into the loop body, as one straight over the call does.
/// </summary>
internal sealed class DeferredIterator : IEnumerable<object?>
{
    private readonly Func<object?> run;

    public DeferredIterator(IOperation site, Func<object?> run)
    {
        Site = site;
        this.run = run;
    }

    /// <summary>The call that made it (where a foreach streaming it is matched, and where it is reported).</summary>
    public IOperation Site { get; }

    /// <summary>Runs the iterator now: its values (a List), StreamedIterator when a foreach consumed them, or Unknown.</summary>
    public object? RunNow() => run();

    public IEnumerator<object?> GetEnumerator()
        => RunNow() is List<object?> values ? values.GetEnumerator() : throw new UnknownValueException();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    // .NET prints the compiler-generated class of the iterator, which the elaborator does not name.
    public override string ToString() => throw UnknownValueException.Unsupported("the text of an iterator's sequence", "it prints the name of a class the compiler generates");
}
