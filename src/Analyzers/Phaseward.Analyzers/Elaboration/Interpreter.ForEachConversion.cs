using System;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// A foreach variable of a narrower type than the elements (foreach (LatchCell c in cells), foreach (int v in objects)):
// each element is explicitly converted to it (C# specification §13.9.5), so an element of another type throws
// InvalidCastException there, as a cast would.
internal sealed partial class Interpreter
{
    // Asked of the semantic model once per loop, not each time an inner loop runs again.
    private readonly System.Collections.Generic.Dictionary<IForEachLoopOperation, bool> castingLoops = new();

    /// <summary>Whether the loop's elements are cast to its variable's type with a run-time test (a downcast or an unboxing).</summary>
    private bool CastsElements(IForEachLoopOperation loop)
    {
        if (castingLoops.TryGetValue(loop, out var casts))
            return casts;
        casts = loop.SemanticModel is { } model && loop.Syntax is CommonForEachStatementSyntax syntax
            && Microsoft.CodeAnalysis.CSharp.CSharpExtensions.GetForEachStatementInfo(model, syntax).ElementConversion is var conversion
            && (conversion.IsUnboxing || conversion.IsReference && conversion.IsExplicit);
        castingLoops[loop] = casts;
        return casts;
    }

    /// <summary>
    /// An element cast to the loop variable's type: the element (unboxed) when it is of it, else the InvalidCastException
    /// (NullReferenceException for a null unboxed) the run throws; what cannot be decided is PW9001 and the element unknown.
    /// </summary>
    private object? CastElement(IForEachLoopOperation loop, object? item, ITypeSymbol variableType, Frame frame)
    {
        var toNullable = NullableUnderlying(variableType) is not null;
        var target = Resolved(NullableUnderlying(variableType) ?? variableType, frame) ?? variableType;
        if (item is null)
            return target.IsValueType && !toNullable ? RaiseInLoop(loop, new NullReferenceException("Object reference not set to an instance of an object.")) : null;
        var unboxes = target.IsValueType ? UnboxesTo(item, target, toNullable) : null;
        var fits = unboxes ?? IsOfType(item, target, frame);
        if (fits is null)
            return Unsupported(loop.Collection, "this foreach over elements cast to " + Describe(variableType), "whether an element is of that type cannot be decided at compile time");

        if (fits.Value)
            return unboxes is null ? item : UnboxedAs(item, target);
        return RaiseInLoop(loop, new InvalidCastException("an element cannot be cast to " + Describe(variableType)));
    }

    // Caught by the design inside a try; outside one the run ends there (PW9003).
    private object? RaiseInLoop(IForEachLoopOperation loop, Exception exception)
    {
        Raise(loop.Syntax, exception);
        throw new ElaborationStopped();
    }
}
