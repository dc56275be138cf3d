using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

// Calls: methods and local functions of the design interpreted in a new frame; the DSL and pure library members called
// natively (CallClr) with the circuit told where the call was written; arguments in parameter order, ref/out included.
internal sealed partial class Interpreter
{
    private object? VisitInvocation(IInvocationOperation invocation, Frame frame)
    {
        Step(invocation);
        var method = invocation.TargetMethod;
        var receiver = invocation.Instance is null ? null : Evaluate(invocation.Instance, frame);
        if (Unknown.Is(receiver)) return Skipped(invocation, frame); // which method or delegate runs is not known
        // An instance method called through null throws in C#; it must never run on the frame's own object instead.
        if (receiver is null && !method.IsStatic && ThroughReference(invocation.Instance) is { } nullReceiver)
            return NullReference(invocation, nullReceiver, "the call to " + Describe(method));

        if (invocation.ConstrainedToType is { } constrained && method.IsStatic)
        {
            if (StaticImplementation(constrained, method, frame) is not IMethodSymbol staticImplementation)
                return Unsupported(invocation, "the call to " + Describe(method), "what the type parameter stands for is not known here");
            method = staticImplementation;
        }

        if (receiver is Circuit circuit && method.Name == nameof(Circuit.Place) && ClrTypes.IsDsl(method))
            return PlaceBlock(invocation, circuit, frame);

        if (receiver is InterpretedObject target && method.ContainingType?.TypeKind == TypeKind.Interface
            && target.Type.FindImplementationForInterfaceMember(method) is IMethodSymbol implementation)
            method = implementation;

        if (session.IsInSource(method) && !method.IsImplicitlyDeclared && (method.MethodKind is MethodKind.Ordinary or MethodKind.LocalFunction or MethodKind.ExplicitInterfaceImplementation))
        {
            // A struct method called on a value that is not a variable (a readonly field, a property, a call's result)
            // runs on a copy, as in C#: what it changes is not kept.
            if (receiver is InterpretedObject { Type.IsValueType: true } structValue && !IsVariable(invocation.Instance!, frame))
                receiver = structValue.Copy();
            if (invocation.IsVirtual && receiver is InterpretedObject instance)
                method = FindOverride(instance.Type, method) ?? method;
            // Run even when an argument is unknown: what depends on it stays unknown inside, and the rest of what the
            // method does (state it changes, devices it makes) is not lost.
            var (arguments, references) = Arguments(invocation.Arguments, method, frame, keepUnknown: true);
            if (method is { IsStatic: true, MethodKind: MethodKind.Ordinary, ContainingType: { } owner } && !InitializeForUse(StaticOwner(owner, frame), invocation.Syntax))
                return Unknown.Value;
            return InvokeUser(method, receiver as InterpretedObject ?? (method.IsStatic ? null : frame.Instance), arguments!, references, invocation, frame);
        }

        if (method.MethodKind == MethodKind.DelegateInvoke)
        {
            var (delegateArguments, _) = Arguments(invocation.Arguments, method, frame, keepUnknown: true);
            return receiver is Closure closure
                ? CallClosure(closure, delegateArguments!, invocation)
                : Unsupported(invocation, "this delegate call", "the delegate was not made by the design's code");
        }

        if (method is { IsStatic: true, Name: "ReferenceEquals", Parameters.Length: 2 } && method.ContainingType?.SpecialType == SpecialType.System_Object)
        {
            var (pair, _) = Arguments(invocation.Arguments, method, frame);
            return pair is null ? Unknown.Value : SameObject(invocation, pair[0], pair[1]);
        }

        if (method is { Name: "ToString", Parameters.Length: 0 } && receiver is not null and not InterpretedObject && ValueText.PrintsItsType(receiver))
        {
            // A library collection held with erased type arguments: its text comes from the type the source gives it.
            try
            {
                return ValueText.Of(receiver, invocation.Instance?.Type);
            }
            catch (UnknownValueException e)
            {
                return UnknownFrom(e, invocation);
            }
        }

        if (receiver is TupleValue tuple && method.Name is "ToString" or "Equals")
            return CallTupleMember(invocation, tuple, method, frame);
        if (receiver is EnumValue enumValue)
            return CallEnumMember(invocation, enumValue, method, frame);
        if (DesignEnumOf(invocation, frame) is { } designEnum)
            return CallDesignEnumStatic(invocation, designEnum, frame);

        if (receiver is InterpretedObject self)
            return CallObjectMember(invocation, self, method, frame);

        if (IsNullableMember(method))
            return CallNullableMember(invocation, method, receiver, frame);

        if (receiver is TypeValue typeValue)
            return CallTypeMember(invocation, typeValue, method, frame);

        if (!ClrTypes.IsDsl(method) && !Library.IsPure(method))
            return Skipped(invocation, frame, Unsupported(invocation, "the call to " + Describe(method),
                "it is outside what compile-time elaboration runs (only the Phaseward DSL, methods of this compilation and pure library members such as string, Math, LINQ and the collections)"));

        if (receiver is System.Text.StringBuilder builder && AppendInterpolated(invocation, builder, frame) is { } appended)
            return appended;
        if (!method.IsStatic && Mutators.Contains(method.Name) && receiver is not string)
            NoteStoreThrough(invocation.Instance, frame);
        var (values, byReference) = Arguments(invocation.Arguments, method, frame);
        var result = values is null ? Unknown.Value : WithTypeArgument(invocation, method, values, CallClr(invocation, method, receiver, values, byReference, frame), frame);
        // A library call that could not be made (or failed half-way) may have changed the collections it was given or
        // called on: they become unknown, never read as they were before the call.
        if (Unknown.Is(result) && !ClrTypes.IsDsl(method))
        {
            Poison(invocation, frame); // the callbacks it was given may not have run, or not to the end
            PoisonMutables(invocation, frame);
        }
        return result;
    }

    /// <summary>The members of the pure library's collections and StringBuilder that change the object they are called on.</summary>
    internal static readonly HashSet<string> Mutators = new(StringComparer.Ordinal)
    {
        "Add", "AddRange", "Insert", "InsertRange", "Remove", "RemoveAt", "RemoveAll", "RemoveRange", "RemoveWhere", "Clear", "Push", "Pop",
        "Enqueue", "Dequeue", "TryAdd", "TryPop", "TryDequeue", "TryRemove", "Sort", "Reverse", "Append", "AppendLine", "AppendFormat",
        "AppendJoin", "Replace", "UnionWith", "IntersectWith", "ExceptWith", "SymmetricExceptWith", "TrimExcess", "EnsureCapacity", "CopyTo",
    };

    /// <summary>
    /// Calls the real DSL (or library) member behind <paramref name="method"/>, telling the circuit where the call is.
    /// <paramref name="arguments"/> is converted in place to the member's parameter types.
    /// </summary>
    /// <param name="frame">Where the call is written: what the type parameters in the member's types stand for (null: not generic code).</param>
    private object? CallClr(IOperation site, IMethodSymbol method, object? receiver, object?[] arguments, Variable?[]? references = null, Frame? frame = null)
    {
        var isDsl = ClrTypes.IsDsl(method);
        var member = isDsl ? session.MemberOf(method) : session.LibraryMemberOf(method);
        if (member is null)
            return Unsupported(site, "the call to " + Describe(method), isDsl
                ? "the Phaseward assembly loaded by the compiler has no such member (is it older than the one the project references?)"
                : "the library member was not found for the values at hand");
        if (receiver is not null && !isDsl)
            member = Library.ForReceiver(member, receiver);
        if (receiver is not null && member.DeclaringType is { IsPrimitive: true } primitive && receiver.GetType() != primitive)
            receiver = ToClr(receiver, primitive);
        if (!isDsl && !ChargeSizes(site, member, arguments))
            return Unknown.Value;
        if (!isDsl && RefusedArrayStore(site, method, receiver, arguments) is { } refused)
            return refused;
        if (!isDsl && method.Name is "Format" or "AppendFormat" && arguments.Any(a => a is InterpretedObject o && FormattableToString(o) is not null
                || a is object?[] items && items.Any(i => i is InterpretedObject io && FormattableToString(io) is not null)))
            return Unsupported(site, "the call to " + Describe(method),
                "it would format an object of the design that is IFormattable, through its ToString(format, provider), which the library cannot call back");

        // Converted in place: every caller hands over an array it made for this call (one array per call, not two).
        var given = !isDsl && MayReadCulture(method) ? (object?[])arguments.Clone() : null;
        var parameterTypes = session.ParameterTypesOf(member);
        if (arguments.Length != parameterTypes.Length)
            return Unsupported(site, "the call to " + Describe(method), "its arguments could not be passed (the run-time member takes " + parameterTypes.Length + ")");
        var clrArguments = arguments;
        for (var i = 0; i < parameterTypes.Length; i++)
        {
            // A lazy sequence made in generic code (its element type a type parameter there) meets its static type here.
            if (!isDsl && i < method.Parameters.Length)
                arguments[i] = OwnCopy(WithErasedDefaults(arguments[i], method.Parameters[i].Type), Resolved(method.Parameters[i].Type, frame));
            clrArguments[i] = ToClr(arguments[i], parameterTypes[i]);
            if (clrArguments[i] is Unconvertible)
                return Unsupported(site, "the call to " + Describe(method), "argument " + (i + 1) + " cannot be passed to the library as " + parameterTypes[i].Name);
        }

        var circuit = Circuit;
        if (isDsl && receiver is Circuit)
            NoteEffect();
        if (circuit is not null)
        {
            // One delegate per interpreter (not a closure per call): the DSL asks for the site synchronously, during
            // this call, and a DSL member never calls back into the interpreter.
            clrSite = site;
            clrSiteCallers = callers;
            circuit.SourceSiteProvider = clrSiteProvider ??= CurrentClrSite;
        }

        try
        {
            object? result;
            if (isDsl)
                result = member is ConstructorInfo constructor ? constructor.Invoke(clrArguments) : member.Invoke(receiver, clrArguments);
            else if (InvokeInCulture(member, method, receiver, clrArguments, given, out result) is { } cultureDependent)
                return Unsupported(site, "the call to " + Describe(method), cultureDependent);
            if (references is not null)
                for (var i = 0; i < references.Length && i < clrArguments.Length; i++)
                    if (references[i] is { } reference)
                        reference.Value = TypedIfArray(WithErasedDefaults(FromClr(clrArguments[i]), Resolved(method.Parameters[i].Type, frame)), method.Parameters[i].Type, frame);
            if (circuit is not null && (circuit.DeviceCount > limits.DeviceBudget || circuit.NetCount > limits.DeviceBudget))
            {
                Report(RuleCatalog.ElaborationBudgetExceeded.Id, loops.Count > 0 ? loops.Peek().Syntax : site.Syntax, DesignName,
                    $"the device budget of {limits.DeviceBudget} devices (or nets; phaseward.elaboration_device_budget) is used up");
                throw new ElaborationStopped();
            }

            if (isDsl)
                return TypedIfArray(FromClr(result), method.ReturnType, frame);
            Charge(site, result);
            RestoreErasedDefaults(site, clrArguments);
            var resultType = method.MethodKind == MethodKind.Constructor ? method.ContainingType : Resolved(method.ReturnType, frame);
            if (IsExtremeOfNothing(method, result, resultType))
                return Raise(site.Syntax, new InvalidOperationException("Sequence contains no elements"));
            var value = WithErasedDefaults(FromClr(result), method.MethodKind == MethodKind.Constructor ? null : resultType);
            OwnLibraryCopies(site, method, receiver, clrArguments, value, resultType, frame);
            return method.Name == "Clone" && receiver is object?[] original && value is object?[] clone
                ? CloneOf(original, clone)
                : TypedIfConstructed(TypedIfArray(value, resultType, frame), resultType, frame);
        }
        catch (TargetInvocationException e) when (e.InnerException is ElaborationStopped or UnknownValueException or DesignException
            || e.InnerException?.InnerException is UnknownValueException)
        {
            // A library method may wrap what a callback threw (Array.Sort: "Failed to compare two elements").
            if ((e.InnerException as UnknownValueException ?? e.InnerException?.InnerException) is UnknownValueException unknown) return UnknownFrom(unknown, site);
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerException).Throw();
            throw;
        }
        catch (TargetInvocationException e) when (e.InnerException is { } inner && inner is not OperationCanceledException)
        {
            return RaiseFromLibrary(site, inner);
        }
        catch (Exception e) when (e is ArgumentException or TargetParameterCountException or InvalidCastException or MemberAccessException or TargetException)
        {
            return Unsupported(site, "the call to " + Describe(method), "its arguments could not be passed (" + e.Message + ")");
        }
        finally
        {
            if (circuit is not null)
                circuit.SourceSiteProvider = null;
        }
    }

    private SourceSpan CurrentClrSite()
    {
        var syntax = clrSite!.Syntax;
        if (loops.Count == 0)
            return SourceSites.For(syntax, clrSiteCallers);
        if (!loopSites.TryGetValue((syntax, clrSiteCallers), out var span))
            loopSites.Add((syntax, clrSiteCallers), span = SourceSites.For(syntax, clrSiteCallers));
        return span;
    }

    /// <summary>
    /// Evaluates arguments into parameter order. Returns null values when an argument is unknown (a native call is then
    /// skipped without a report: the unknown value was reported where it arose).
    /// </summary>
    /// <param name="keepUnknown">Give the values even when one is unknown (for the design's own methods, which are run anyway).</param>
    private (object?[]? Values, Variable?[] References) Arguments(ImmutableArray<IArgumentOperation> arguments, IMethodSymbol method, Frame frame, bool keepUnknown = false)
    {
        var values = new object?[method.Parameters.Length];
        // Allocated only when a ref/out argument needs it (DSL calls never do); an empty array means none.
        Variable?[]? references = null;
        var unknown = false;
        foreach (var argument in arguments)
        {
            var ordinal = argument.Parameter?.Ordinal ?? -1;
            if (ordinal < 0 || ordinal >= values.Length)
                continue;
            if (argument.Parameter!.RefKind is RefKind.Ref or RefKind.Out)
            {
                var variable = VariableOf(argument.Value, frame);
                if (variable is null)
                {
                    Unsupported(argument, "this ref/out argument", "only locals, parameters and fields of the design are passed by reference");
                    // The callee may write through it: what it refers to (an element, a tuple's part) becomes unknown.
                    Poison(argument, frame);
                    values[ordinal] = Unknown.Value;
                    unknown = true;
                    continue;
                }

                (references ??= new Variable?[method.Parameters.Length])[ordinal] = variable;
                values[ordinal] = Read(variable, ReferencedSymbol(argument.Value));
                continue;
            }

            // An 'in' (or 'ref readonly') argument that is a variable is passed by reference too: the callee sees what
            // is written to it during the call (through a 'ref' argument or a field), as in C#.
            if (argument.Parameter.RefKind is RefKind.In or RefKind.RefReadOnlyParameter && session.IsInSource(method)
                && VariableOf(argument.Value, frame) is { } readOnlyVariable)
            {
                (references ??= new Variable?[method.Parameters.Length])[ordinal] = readOnlyVariable;
                values[ordinal] = Read(readOnlyVariable, ReferencedSymbol(argument.Value));
                continue;
            }

            var value = Evaluate(argument.Value, frame);
            if (Unknown.Is(value))
                unknown = true;
            values[ordinal] = value;
        }

        return (unknown && !keepUnknown ? null : values, references ?? Array.Empty<Variable?>());
    }

    /// <summary>Runs a method, local function or accessor declared in this compilation.</summary>
    private object? InvokeUser(IMethodSymbol method, InterpretedObject? instance, object?[] arguments, Variable?[] references, IOperation site, Frame caller)
    {
        var body = session.BodyOf(method, m => BodyOf((IMethodSymbol)m));
        if (body is null)
            return Unsupported(site, "the call to " + Describe(method), "its body could not be found (abstract, partial or extern)");

        Frame? parent = null;
        if (method.MethodKind == MethodKind.LocalFunction && method.ContainingSymbol is IMethodSymbol container)
        {
            parent = caller.FrameOf(container);
            if (parent is null)
                return Unsupported(site, "the call to " + Describe(method), "its enclosing method is not running");
            instance ??= parent.Instance;
        }

        EnterCall(site);
        var outerCallers = callers;
        PushCaller(site.Syntax);
        try
        {
            frameSizes.TryGetValue(body, out var expectedVariables);
            var frame = new Frame(method.OriginalDefinition, parent, method.IsStatic && method.MethodKind != MethodKind.LocalFunction ? null : instance, expectedVariables);
            // A partial method's body (the implementing part) names its own parameters.
            var parameters = (method.OriginalDefinition.PartialImplementationPart ?? method.OriginalDefinition).Parameters;
            frame.TypeArguments = TypeArgumentsOf(method, caller);
            for (var i = 0; i < parameters.Length && i < arguments.Length; i++)
            {
                if (i < references.Length && references[i] is { } variable)
                    frame.Bind(parameters[i], variable);
                else
                    frame.Declare(parameters[i], CopyIfValue(arguments[i], parameters[i].Type, frame));
            }

            if (IsIterator(body))
            {
                var runNow = runIteratorNow;
                runIteratorNow = false;
                if (streamTo is { } stream && ReferenceEquals(stream.Site, site))
                {
                    streamTo = null;
                    frame.Consumer = stream.Consume;
                }
                else if (runNow)
                {
                    frame.Yielded = new List<object?>();
                }
                else
                {
                    // Nothing runs at the call: each enumeration runs it from the start with these arguments.
                    var given = (object?[])arguments.Clone();
                    return new DeferredIterator(site, () => RunDeferred(method, instance, given, site, caller));
                }
            }

            if (frame.Yielded is not null)
                return RunToCompletion(method, body, frame, site);
            LeaveBody(Execute(body, frame), frame);
            if (frame.Count > expectedVariables)
                frameSizes[body] = frame.Count;
            return frame.Consumer is not null ? StreamedIterator.Value : frame.ReturnValue;
        }
        finally
        {
            // The caller chains are never mutated once built, so the outer chain is restored as it was.
            callers = outerCallers;
            LeaveCall();
        }
    }

    /// <summary>
    /// The type arguments a call of a generic method (or of a method of a generic type) runs with, each resolved through
    /// the caller's own (a generic helper calling another with its T). Null for a method that is not generic.
    /// </summary>
    private Dictionary<ITypeParameterSymbol, ITypeSymbol>? TypeArgumentsOf(IMethodSymbol method, Frame caller)
    {
        Dictionary<ITypeParameterSymbol, ITypeSymbol>? arguments = null;
        void Add(ImmutableArray<ITypeParameterSymbol> parameters, ImmutableArray<ITypeSymbol> types)
        {
            for (var i = 0; i < parameters.Length && i < types.Length; i++)
            {
                // Resolved wherever the caller's type parameters stand in it (List<T> as well as T).
                var type = ResolvedIn(types[i], caller) ?? types[i];
                if (!SymbolEqualityComparer.Default.Equals(type, parameters[i]))
                    (arguments ??= new(SymbolEqualityComparer.Default))[(ITypeParameterSymbol)parameters[i].OriginalDefinition] = type;
            }
        }

        if (method.IsGenericMethod)
            Add(method.OriginalDefinition.TypeParameters, method.TypeArguments);
        for (var type = method.ContainingType; type is not null; type = type.ContainingType)
            if (type.IsGenericType)
                Add(type.OriginalDefinition.TypeParameters, type.TypeArguments);
        return arguments;
    }

    /// <summary>
    /// An iterator not enumerated straight by a foreach runs to completion when called, its values kept in a list. If it
    /// changes anything outside itself meanwhile (a field, a captured variable, a collection it did not make, devices),
    /// those changes come earlier than in C#: PW9001 at the call, and its values are not used.
    /// </summary>
    /// <summary>Set for the one call that runs a <see cref="DeferredIterator"/> now (see <see cref="RunDeferred"/>).</summary>
    private bool runIteratorNow;

    /// <summary>Runs a deferred iterator call from the start, with the arguments it was called with.</summary>
    private object? RunDeferred(IMethodSymbol method, InterpretedObject? instance, object?[] arguments, IOperation site, Frame caller)
    {
        runIteratorNow = true;
        try
        {
            return InvokeUser(method, instance, (object?[])arguments.Clone(), Array.Empty<Variable?>(), site, caller);
        }
        finally
        {
            runIteratorNow = false;
        }
    }

    private object? RunToCompletion(IMethodSymbol method, IOperation body, Frame frame, IOperation site)
    {
        var effectsBefore = externalEffects;
        var outerObjects = iteratorObjectsAfter;
        iteratorObjectsAfter = InterpretedObject.LastSerial;
        // What it throws is kept from the caller's catch clauses (and their filters): in C# it throws only when
        // enumerated, and only if enumerated that far.
        var (outerTries, outerTryDepth) = (activeTries, tryDepth);
        activeTries = new();
        tryDepth = outerTryDepth + 1;
        Completion completion;
        try
        {
            completion = Execute(body, frame);
        }
        catch (DesignException e)
        {
            return Unsupported(site, "the iterator " + Describe(method),
                "it throws (" + e.Describe() + ") when run to the end, and an iterator not enumerated straight by a foreach is run to completion when "
                + "called: in C# none of it runs until it is enumerated, and whether it throws depends on how far it is enumerated");
        }
        finally
        {
            iteratorObjectsAfter = outerObjects;
            (activeTries, tryDepth) = (outerTries, outerTryDepth);
        }

        // It may have stopped (yield break) or thrown in code that was skipped: which values it yields is not known.
        if (completion.IsMaybe)
            return Unknown.Value;

        if (externalEffects == effectsBefore)
            return frame.Yielded;
        return Unsupported(site, "the iterator " + Describe(method),
            "it changes state outside itself as it runs (a field, a captured variable, a collection it did not make, devices), and an iterator not enumerated "
            + "straight by a foreach is run to completion when called, so those changes would come earlier than in C#");
    }

    /// <summary>Counts a store or call that changes state outside the code's own frame (see externalEffects).</summary>
    private void NoteEffect() => externalEffects++;

    /// <summary>A store into a field of this object: an effect unless the iterator being run made the object.</summary>
    private void NoteStoreInto(InterpretedObject? owner)
    {
        if (owner is null || owner.Serial <= iteratorObjectsAfter)
            externalEffects++;
    }

    /// <summary>A store into (or a mutating call on) what this operation holds: an effect unless it is a local of this frame.</summary>
    private void NoteStoreThrough(IOperation? holder, Frame frame)
    {
        if (holder is not ILocalReferenceOperation local || !frame.Declares(local.Local))
            externalEffects++;
    }

    private bool IsIterator(IOperation body)
    {
        if (!iterators.TryGetValue(body, out var isIterator))
            iterators[body] = isIterator = body.Syntax.DescendantNodes(n => n is not (Microsoft.CodeAnalysis.CSharp.Syntax.LocalFunctionStatementSyntax
                    or Microsoft.CodeAnalysis.CSharp.Syntax.AnonymousFunctionExpressionSyntax))
                .Any(n => n is YieldStatementSyntax);
        return isIterator;
    }

    private IOperation? BodyOf(IMethodSymbol method)
    {
        var syntax = method.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken);
        if (syntax is null)
            return null;
        // A partial method's implementation is the part with a body.
        if (method.PartialImplementationPart is { } implementation)
            syntax = implementation.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken) ?? syntax;

        var operation = ModelOf(syntax).GetOperation(syntax, cancellationToken);
        return operation switch
        {
            IMethodBodyOperation body => (IOperation?)body.BlockBody ?? body.ExpressionBody,
            ILocalFunctionOperation local => (IOperation?)local.Body ?? local.IgnoredBody,
            IBlockOperation block => block,
            // An expression-bodied property or indexer getter ('=> value').
            { } expression when syntax is ArrowExpressionClauseSyntax => expression,
            _ => null,
        };
    }

    /// <summary>
    /// The member that runs for <paramref name="member"/> (a method or property) on an object of <paramref name="type"/>:
    /// the nearest override, or for an interface member the type's implementation (itself perhaps overridden).
    /// </summary>
    private static T? FindOverride<T>(INamedTypeSymbol type, T member)
        where T : class, ISymbol
    {
        if (member.ContainingType?.TypeKind == TypeKind.Interface)
        {
            if (type.FindImplementationForInterfaceMember(member) is not T implementation)
                return null;
            member = implementation;
        }

        for (var current = type; current is not null; current = current.BaseType)
            foreach (var candidate in current.GetMembers(member.Name))
                if (candidate is T overriding)
                    for (ISymbol? m = overriding; m is not null; m = Overridden(m))
                        if (SymbolEqualityComparer.Default.Equals(m.OriginalDefinition, member.OriginalDefinition))
                            return overriding;
        return null;
    }

    private static ISymbol? Overridden(ISymbol member) => member switch
    {
        IMethodSymbol method => method.OverriddenMethod,
        IPropertySymbol property => property.OverriddenProperty,
        _ => null,
    };

    /// <summary>
    /// Does the operation denote a variable (a struct method called on it changes it), rather than a value (a readonly
    /// field outside its constructor, an 'in' parameter, a property, a call's result: the method runs on a copy)?
    /// </summary>
    private static bool IsVariable(IOperation operation, Frame frame) => operation switch
    {
        // A struct reached through a reference type (object, an interface) is a box: the call changes the box itself.
        _ when IsReferenceType(operation.Type, frame) => true,
        // A foreach or using variable is read-only: C# calls a method that may change it on a copy.
        ILocalReferenceOperation local => local.Local.RefKind != RefKind.RefReadOnly && !local.Local.IsForEach && !local.Local.IsUsing,
        IParameterReferenceOperation parameter => parameter.Parameter.RefKind is not (RefKind.In or RefKind.RefReadOnlyParameter),
        IInstanceReferenceOperation or IArrayElementReferenceOperation => true,
        IFieldReferenceOperation field => (!field.Field.IsReadOnly || IsConstructorOf(frame, field.Field.ContainingType))
            && (field.Field.IsStatic || field.Instance is null || field.Instance.Type?.IsReferenceType == true || IsVariable(field.Instance, frame)),
        _ => false,
    };

    /// <summary>Is the code running in a constructor of the type (where its readonly fields may still be written)?</summary>
    private static bool IsConstructorOf(Frame frame, INamedTypeSymbol type)
        => frame.Method is { MethodKind: MethodKind.Constructor or MethodKind.StaticConstructor } method
            && SymbolEqualityComparer.Default.Equals(method.ContainingType.OriginalDefinition, type.OriginalDefinition);

    /// <summary>The variable an operation denotes (for ref/out arguments), declaring 'out var' locals.</summary>
    private Variable? VariableOf(IOperation operation, Frame frame)
    {
        switch (operation)
        {
            case IDeclarationExpressionOperation { Expression: ILocalReferenceOperation local }:
                frame.Declare(local.Local, DefaultOf(local.Local.Type, frame));
                return frame.Find(local.Local);
            case ILocalReferenceOperation local:
                if (!frame.Declares(local.Local)) NoteEffect();
                return frame.Find(local.Local);
            case IParameterReferenceOperation parameter:
                if (!frame.Declares(parameter.Parameter)) NoteEffect();
                return frame.Find(parameter.Parameter) ?? frame.Instance?.Find(parameter.Parameter);
            case IDiscardOperation:
                return new Variable(null);
            case IFieldReferenceOperation field when session.IsInSource(field.Field):
                if (field.Field.IsStatic)
                {
                    NoteEffect();
                    return StaticVariable(field.Field, frame, field.Syntax);
                }

                var ownerValue = field.Instance is null ? frame.Instance : Evaluate(field.Instance, frame);
                if (Unknown.Is(ownerValue))
                    return WriteToUnknownOwner(field.Field);
                if (ownerValue is null && ThroughReference(field.Instance) is { } nullOwner)
                {
                    // Nothing is stored: the write is made to a variable nobody reads, after the exception is raised.
                    NullReference(field, nullOwner, "field " + Describe(field.Field));
                    return new Variable(Unknown.Value);
                }

                var owner = ownerValue as InterpretedObject;
                NoteStoreInto(owner);
                return owner?.GetOrAdd(field.Field);
            default:
                return null;
        }
    }
}
