using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Elaborates one design at compile time: makes the design object (running its constructor on known arguments),
/// makes the circuit with the design's name, interprets Describe, and returns the netlist and what was reported.
/// </summary>
/// <remarks>
/// Which constructor: the first <c>new TheDesign(...)</c> in the compilation (files in compilation order, then source
/// order) whose arguments are all known at compile time; otherwise a constructor callable without arguments. Other
/// instantiations with different arguments are not elaborated separately.
/// </remarks>
internal static class DesignElaborator
{
    public static ElaborationResult Elaborate(ElaborationSession session, DesignInfo design, ElaborationLimits limits, CancellationToken cancellationToken)
    {
        // The library code the design calls runs in the invariant culture, never the compiler's (see ValueText): set once
        // for the whole elaboration, on this thread, and restored after.
        var thread = Thread.CurrentThread;
        var compilerCulture = thread.CurrentCulture;
        thread.CurrentCulture = System.Globalization.CultureInfo.InvariantCulture;
        try
        {
            return ElaborateInvariant(session, design, limits, cancellationToken);
        }
        finally
        {
            thread.CurrentCulture = compilerCulture;
        }
    }

    private static ElaborationResult ElaborateInvariant(ElaborationSession session, DesignInfo design, ElaborationLimits limits, CancellationToken cancellationToken)
    {
        var interpreter = new Interpreter(session, design.Type.MetadataName, limits, cancellationToken);
        var describeBody = session.BodyOf(design.Describe, _ => BodyOf(session, design));
        if (describeBody is null)
            return new ElaborationResult(interpreter.DesignName, null, interpreter.Issues, 0);

        Circuit? circuit = null;
        try
        {
            var instance = interpreter.NewObject(design.Type);
            if (!Construct(session, interpreter, design, instance, describeBody, cancellationToken))
                return new ElaborationResult(interpreter.DesignName, null, interpreter.Issues, interpreter.Steps);

            interpreter.DesignName = interpreter.ComputeName(instance, describeBody);
            try
            {
                circuit = new Circuit(interpreter.DesignName);
            }
            catch (ArgumentException e)
            {
                interpreter.Throws(design.DescribeSyntax, e.Message);
                return new ElaborationResult(interpreter.DesignName, null, interpreter.Issues, interpreter.Steps);
            }

            interpreter.Circuit = circuit;
            var frame = new Frame(design.Describe.OriginalDefinition, null, instance);
            frame.Declare(design.Describe.OriginalDefinition.Parameters[0], circuit);
            interpreter.Execute(describeBody, frame);
        }
        catch (ElaborationStopped)
        {
            // Reported where it happened; the part built so far is still checked.
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            // A gap in the interpreter must never crash the compiler: report it like any construct it cannot handle.
            var site = interpreter.Current ?? describeBody;
            interpreter.Unsupported(site, "this code", "the elaborator failed on it (" + e.GetType().Name + ": " + e.Message + ")");
        }

        if (circuit is not null)
            circuit.SourceSiteProvider = null;
        return new ElaborationResult(interpreter.DesignName, circuit?.ToNetlist(), interpreter.Issues, interpreter.Steps);
    }

    private static bool Construct(ElaborationSession session, Interpreter interpreter, DesignInfo design, InterpretedObject instance,
        IOperation describeBody, CancellationToken cancellationToken)
    {
        foreach (var creation in session.Catalog.CreationsOf(design.Type, cancellationToken))
        {
            if (creation.Constructor is not { } constructor)
                continue;
            interpreter.Silent = true;
            object?[]? arguments;
            try
            {
                arguments = constructor.Parameters.Select(_ => (object?)null).ToArray();
                var frame = new Frame(null, null, null);
                foreach (var argument in creation.Arguments)
                    if (argument.Parameter is { } parameter)
                        arguments[parameter.Ordinal] = interpreter.Evaluate(argument.Value, frame);
                if (creation.Initializer is not null || arguments.Any(Unknown.Is))
                    arguments = null;
            }
            catch (ElaborationStopped)
            {
                arguments = null;
            }
            finally
            {
                interpreter.Silent = false;
            }

            if (arguments is not null)
            {
                interpreter.Construct(instance, constructor, arguments, creation);
                return true;
            }
        }

        var parameterless = design.Type.InstanceConstructors.FirstOrDefault(c => c.Parameters.All(p => p.IsOptional));
        if (parameterless is not null)
        {
            interpreter.Construct(instance, parameterless,
                parameterless.Parameters.Select(p => p.HasExplicitDefaultValue ? p.ExplicitDefaultValue : null).ToArray(), null);
            return true;
        }

        interpreter.Unsupported(describeBody, "design '" + design.Type.Name + "'",
            "it has no parameterless constructor and is not created with arguments known at compile time anywhere in this compilation");
        return false;
    }

    private static IOperation? BodyOf(ElaborationSession session, DesignInfo design)
    {
        var model = session.Models.Get(design.AnchorTree);
        return model.GetOperation(design.DescribeSyntax) switch
        {
            IMethodBodyOperation body => (IOperation?)body.BlockBody ?? body.ExpressionBody,
            _ => null,
        };
    }
}
