using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Circuit.Place: the real circuit opens and closes the block's name scope (the same checks and names as at run
// time); the block's Describe, being the design's code, is interpreted in between.
internal sealed partial class Interpreter
{
    private object? PlaceBlock(IInvocationOperation invocation, Circuit circuit, Frame frame)
    {
        NoteEffect();
        var (arguments, _) = Arguments(invocation.Arguments, invocation.TargetMethod, frame);
        if (arguments is null) return Unknown.Value;
        if (arguments[0] is not InterpretedObject block)
            return arguments[0] is null
                ? ThrowsUnknown(invocation, "ArgumentNullException: 'block' must not be null.")
                : Unsupported(invocation, "this block", "only blocks declared in this compilation are placed at compile time");

        var describe = session.BlockDescribe is { } abstractDescribe ? FindOverride(block.Type, abstractDescribe) : null;
        if (describe is null || !session.IsInSource(describe))
            return Unsupported(invocation, "the block " + Describe(block.Type), "its Describe override was not found in this compilation");

        string outer;
        try
        {
            outer = circuit.EnterBlock(block, arguments[1] as string);
        }
        catch (System.ArgumentException e)
        {
            // The circuit's own exception (its ParamName kept) is what a design that catches it sees.
            if (tryDepth > 0)
                throw new DesignException(e, invocation.Syntax);
            return ThrowsUnknown(invocation, e.GetType().Name + ": " + e.Message);
        }

        try
        {
            InvokeUser(describe, block, new object?[] { circuit }, System.Array.Empty<Variable?>(), invocation, frame);
        }
        finally
        {
            circuit.ExitBlock(outer);
        }

        return block;
    }

    private object ThrowsUnknown(IOperation site, string message)
    {
        Throws(site.Syntax, message);
        return Unknown.Value;
    }
}
