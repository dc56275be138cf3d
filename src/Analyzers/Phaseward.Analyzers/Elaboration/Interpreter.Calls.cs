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

internal sealed partial class Interpreter
{
    private object? Invoke(IInvocationOperation invocation, Frame frame)
    {
        Step(invocation);
        var method = invocation.TargetMethod;
        var receiver = invocation.Instance is null ? null : Evaluate(invocation.Instance, frame);
        if (Unknown.Is(receiver)) return receiver;

        if (receiver is Circuit circuit && method.Name == nameof(Circuit.Place) && ClrTypes.IsDsl(method))
            return PlaceBlock(invocation, circuit, frame);

        if (receiver is InterpretedObject target && method.ContainingType?.TypeKind == TypeKind.Interface
            && target.Type.FindImplementationForInterfaceMember(method) is IMethodSymbol implementation)
            method = implementation;

        if (session.IsInSource(method) && !method.IsImplicitlyDeclared && (method.MethodKind is MethodKind.Ordinary or MethodKind.LocalFunction or MethodKind.ExplicitInterfaceImplementation))
        {
            if (invocation.IsVirtual && receiver is InterpretedObject instance)
                method = FindOverride(instance.Type, method) ?? method;
            var (arguments, references) = Arguments(invocation.Arguments, method, frame);
            if (arguments is null) return Unknown.Value;
            return InvokeUser(method, receiver as InterpretedObject ?? (method.IsStatic ? null : frame.Instance), arguments, references, invocation, frame);
        }

        if (method.MethodKind == MethodKind.DelegateInvoke)
        {
            var (delegateArguments, _) = Arguments(invocation.Arguments, method, frame);
            if (delegateArguments is null) return Unknown.Value;
            return receiver is Closure closure
                ? CallClosure(closure, delegateArguments, invocation)
                : Unsupported(invocation, "this delegate call", "the delegate was not made by the design's code");
        }

        if (method.Name == "HasFlag" && receiver is int flags && invocation.Arguments.Length == 1)
        {
            // The design's own enums are kept as int, so Enum.HasFlag is answered here.
            var flag = Evaluate(invocation.Arguments[0].Value, frame);
            if (Unknown.Is(flag)) return flag;
            var bits = System.Convert.ToInt32(flag, System.Globalization.CultureInfo.InvariantCulture);
            return (flags & bits) == bits;
        }

        if (receiver is InterpretedObject self)
            return CallObjectMember(invocation, self, method, frame);

        if (!ClrTypes.IsDsl(method) && !Library.IsPure(method))
            return Unsupported(invocation, "the call to " + Describe(method),
                "it is outside what compile-time elaboration runs (only the Phaseward DSL, methods of this compilation and pure library members such as string, Math, LINQ and the collections)");

        var (values, byReference) = Arguments(invocation.Arguments, method, frame);
        if (values is null) return Unknown.Value;
        return CallClr(invocation, method, receiver, values, byReference);
    }

    /// <summary>
    /// Calls the real DSL (or library) member behind <paramref name="method"/>, telling the circuit where the call is.
    /// <paramref name="arguments"/> is converted in place to the member's parameter types.
    /// </summary>
    private object? CallClr(IOperation site, IMethodSymbol method, object? receiver, object?[] arguments, Variable?[]? references = null)
    {
        var isDsl = ClrTypes.IsDsl(method);
        var member = isDsl ? session.MemberOf(method) : session.LibraryMemberOf(method);
        if (member is null)
            return Unsupported(site, "the call to " + Describe(method), isDsl
                ? "the Phaseward assembly loaded by the compiler has no such member (is it older than the one the project references?)"
                : "the library member was not found for the values at hand");
        if (receiver is not null && member.DeclaringType is { IsPrimitive: true } primitive && receiver.GetType() != primitive)
            receiver = ToClr(receiver, primitive);
        if (!isDsl && !ChargeSizes(site, member, arguments))
            return Unknown.Value;

        // Converted in place: every caller hands over an array it made for this call (one array per call, not two).
        var parameterTypes = session.ParameterTypesOf(member);
        if (arguments.Length != parameterTypes.Length)
            return Unsupported(site, "the call to " + Describe(method), "its arguments could not be passed (the run-time member takes " + parameterTypes.Length + ")");
        var clrArguments = arguments;
        for (var i = 0; i < parameterTypes.Length; i++)
        {
            clrArguments[i] = ToClr(arguments[i], parameterTypes[i]);
            if (clrArguments[i] is Unconvertible)
                return Unsupported(site, "the call to " + Describe(method), "argument " + (i + 1) + " cannot be passed to the library as " + parameterTypes[i].Name);
        }

        var circuit = Circuit;
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
            var result = member is ConstructorInfo constructor ? constructor.Invoke(clrArguments) : member.Invoke(receiver, clrArguments);
            if (references is not null)
                for (var i = 0; i < references.Length && i < clrArguments.Length; i++)
                    if (references[i] is { } reference)
                        reference.Value = FromClr(clrArguments[i]);
            if (circuit is not null && (circuit.DeviceCount > limits.DeviceBudget || circuit.NetCount > limits.DeviceBudget))
            {
                Report(RuleCatalog.ElaborationBudgetExceeded.Id, loops.Count > 0 ? loops.Peek().Syntax : site.Syntax, DesignName,
                    $"the device budget of {limits.DeviceBudget} devices (or nets; phaseward.elaboration_device_budget) is used up");
                throw new ElaborationStopped();
            }

            if (!isDsl)
                Charge(site, result);
            return FromClr(result);
        }
        catch (TargetInvocationException e) when (e.InnerException is ElaborationStopped or UnknownValueException or DesignException)
        {
            if (e.InnerException is UnknownValueException) return Unknown.Value;
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerException).Throw();
            throw;
        }
        catch (TargetInvocationException e) when (e.InnerException is { } inner && inner is not OperationCanceledException)
        {
            return RaiseLibraryException(site, inner);
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

    private object? CallOperator(IOperation site, IMethodSymbol method, object?[] operands, Frame frame)
    {
        if (operands.Any(Unknown.Is)) return Unknown.Value;
        Step(site);
        if (method.IsImplicitlyDeclared && operands.Length == 2 && operands[0] is InterpretedObject { Type.IsRecord: true } record
            && method.Name is "op_Equality" or "op_Inequality")
        {
            var equal = AreEqualOrUnknown(record, operands[1]);
            return equal is null ? Unknown.Value : method.Name == "op_Equality" ? equal.Value : !equal.Value;
        }

        if (session.IsInSource(method))
            return InvokeUser(method, null, operands, new Variable?[operands.Length], site, frame);
        if (Library.IsPure(method))
            return CallClr(site, method, null, operands);
        if (ClrTypes.IsDsl(method))
            return CallClr(site, method, null, operands);
        return Unsupported(site, "operator " + Describe(method), "only operators of the Phaseward DSL and of this compilation are elaborated");
    }

    /// <summary>
    /// Evaluates arguments into parameter order. Returns null values when an argument is unknown (the call is then skipped
    /// without a report: the unknown value was reported where it arose).
    /// </summary>
    private (object?[]? Values, Variable?[] References) Arguments(ImmutableArray<IArgumentOperation> arguments, IMethodSymbol method, Frame frame)
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
                    unknown = true;
                    continue;
                }

                (references ??= new Variable?[method.Parameters.Length])[ordinal] = variable;
                values[ordinal] = variable.Value;
                continue;
            }

            var value = Evaluate(argument.Value, frame);
            if (Unknown.Is(value))
                unknown = true;
            values[ordinal] = value;
        }

        return (unknown ? null : values, references ?? Array.Empty<Variable?>());
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
            var parameters = method.OriginalDefinition.Parameters;
            for (var i = 0; i < parameters.Length && i < arguments.Length; i++)
            {
                if (i < references.Length && references[i] is { } variable)
                    frame.Bind(parameters[i], variable);
                else
                    frame.Declare(parameters[i], CopyIfValue(arguments[i]));
            }

            if (IsIterator(body))
                frame.Yielded = new List<object?>();
            Execute(body, frame);
            if (frame.Count > expectedVariables)
                frameSizes[body] = frame.Count;
            return frame.Yielded ?? frame.ReturnValue;
        }
        finally
        {
            // The caller chains are never mutated once built, so the outer chain is restored as it was.
            callers = outerCallers;
            LeaveCall();
        }
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

    private static IMethodSymbol? FindOverride(INamedTypeSymbol type, IMethodSymbol method)
    {
        for (var current = type; current is not null; current = current.BaseType)
            foreach (var member in current.GetMembers(method.Name))
                if (member is IMethodSymbol candidate)
                    for (var m = candidate; m is not null; m = m.OverriddenMethod)
                        if (SymbolEqualityComparer.Default.Equals(m.OriginalDefinition, method.OriginalDefinition))
                            return candidate;
        return null;
    }

    private static IPropertySymbol? FindOverride(INamedTypeSymbol type, IPropertySymbol property)
    {
        for (var current = type; current is not null; current = current.BaseType)
            foreach (var member in current.GetMembers(property.Name))
                if (member is IPropertySymbol candidate)
                    for (var p = candidate; p is not null; p = p.OverriddenProperty)
                        if (SymbolEqualityComparer.Default.Equals(p.OriginalDefinition, property.OriginalDefinition))
                            return candidate;
        return null;
    }

    private object? ReadProperty(IPropertyReferenceOperation reference, Frame frame)
    {
        var property = reference.Property;
        var receiver = reference.Instance is null ? null : Evaluate(reference.Instance, frame);
        if (Unknown.Is(receiver)) return receiver;

        switch (receiver)
        {
            case object?[] array when property.Name == "Length":
                return array.Length;
            case List<object?> list when property.Name == "Count":
                return list.Count;
            case List<object?> list when property.IsIndexer:
                var index = Evaluate(reference.Arguments[0].Value, frame);
                if (Unknown.Is(index)) return index;
                var i = System.Convert.ToInt32(index, System.Globalization.CultureInfo.InvariantCulture);
                if (i >= 0 && i < list.Count) return list[i];
                Throws(reference.Syntax, $"ArgumentOutOfRangeException: index {i} is outside a list of {list.Count} elements");
                return Unknown.Value;
            case string text when property.Name == "Length":
                return text.Length;
            case InterpretedObject instance:
                return ReadDesignProperty(reference, instance, frame);
        }

        if (session.IsInSource(property))
        {
            if (property.IsStatic)
                return IsAutoProperty(property) ? StaticVariable(property, frame).Value : CallGetter(reference, property, null, frame);
            return Unsupported(reference, "property " + Describe(property), "only properties of the design and static properties are elaborated");
        }

        if (!ClrTypes.IsDsl(property) && Library.IsPure(property))
            return ReadLibraryProperty(reference, property, receiver, frame);

        if (!ClrTypes.IsDsl(property) || property.GetMethod is not { } getter)
            return Unsupported(reference, "property " + Describe(property),
                "it is outside what compile-time elaboration reads (only the Phaseward DSL, members of this compilation and pure library members)");

        var (arguments, _) = Arguments(reference.Arguments, getter, frame);
        return arguments is null ? Unknown.Value : CallClr(reference, getter, receiver, arguments);
    }

    private object? ReadDesignProperty(IPropertyReferenceOperation reference, InterpretedObject instance, Frame frame)
    {
        var property = reference.Property;
        if (FindOverride(instance.Type, property) is { } overriding)
            property = overriding;
        if (ClrTypes.IsDsl(property))
            return property.Name == nameof(Design.Name)
                ? DesignName
                : Unsupported(reference, "property " + Describe(property), "the design's inherited Phaseward members are not read at compile time");
        if (!session.IsInSource(property))
            return Unsupported(reference, "property " + Describe(property), "it is not declared in this compilation");
        if (IsAutoProperty(property))
            return instance.Find(property) is { } stored
                ? stored.Value
                : Unsupported(reference, "property " + Describe(property), "it was not initialized by the elaborator");
        return CallGetter(reference, property, instance, frame);
    }

    private object? CallGetter(IPropertyReferenceOperation reference, IPropertySymbol property, InterpretedObject? instance, Frame frame)
    {
        if (property.GetMethod is not { } getter)
            return Unsupported(reference, "property " + Describe(property), "it has no getter");
        Step(reference);
        var (arguments, references) = Arguments(reference.Arguments, getter, frame);
        return arguments is null ? Unknown.Value : InvokeUser(getter, instance, arguments, references, reference, frame);
    }

    /// <summary>A property that stores its value (auto-property, or a record's positional property).</summary>
    private static bool IsAutoProperty(IPropertySymbol property)
        => property.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax() switch
        {
            PropertyDeclarationSyntax { ExpressionBody: null, AccessorList: { } accessors } => accessors.Accessors.All(a => a.Body is null && a.ExpressionBody is null),
            ParameterSyntax => true,
            _ => false,
        };

    /// <summary>The property a record's positional parameter declares (null when the record declares its own).</summary>
    private static IPropertySymbol? PositionalProperty(INamedTypeSymbol record, IParameterSymbol parameter)
        => record.GetMembers(parameter.Name).OfType<IPropertySymbol>()
            .FirstOrDefault(p => p.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax() is ParameterSyntax);

    /// <summary>
    /// A static field or auto-property of this compilation. The first use of any static member of a type runs the type's
    /// static initialization the way C# does: every static field and auto-property initializer in declaration order,
    /// then the static constructor's body; values it assigns are never read as defaults.
    /// </summary>
    private Variable StaticVariable(ISymbol member, Frame frame)
    {
        var key = member.OriginalDefinition;
        if (statics.TryGetValue(key, out var variable))
            return variable;
        if (member.ContainingType is { } type)
            InitializeStatics(type.OriginalDefinition);
        if (!statics.TryGetValue(key, out variable))
            statics[key] = variable = new Variable(DefaultOf(member is IFieldSymbol f ? f.Type : ((IPropertySymbol)member).Type));
        return variable;
    }

    private void InitializeStatics(INamedTypeSymbol type)
    {
        if (!initializedTypes.Add(type))
            return;
        var storage = new List<(ISymbol Member, Variable Variable)>();
        foreach (var member in type.GetMembers())
        {
            ISymbol? stored = member switch
            {
                IFieldSymbol { IsStatic: true, IsConst: false, AssociatedSymbol: null } field => field,
                IPropertySymbol { IsStatic: true } property when IsAutoProperty(property) => property,
                _ => null,
            };
            if (stored is null)
                continue;
            var variable = new Variable(DefaultOf(stored is IFieldSymbol f ? f.Type : ((IPropertySymbol)stored).Type));
            statics[stored.OriginalDefinition] = variable;
            storage.Add((stored, variable));
        }

        var frame = new Frame(null, null, null);
        foreach (var (member, variable) in storage)
            if (InitializerOf(member) is { } initializer)
                variable.Value = Evaluate(initializer, frame);

        foreach (var constructor in type.StaticConstructors)
        {
            var syntax = constructor.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken);
            if (syntax is not ConstructorDeclarationSyntax declaration)
                continue;
            if (ModelOf(declaration).GetOperation(declaration, cancellationToken) is not IConstructorBodyOperation body)
            {
                Report(RuleCatalog.NotElaborated.Id, declaration, "the static constructor of " + Describe(type), "its body could not be read", DesignName);
                continue;
            }

            var statements = (IOperation?)body.BlockBody ?? body.ExpressionBody;
            if (statements is not null)
                Execute(statements, new Frame(constructor, null, null));
        }
    }

    /// <summary>The value operation of a field's or property's initializer (<c>= value</c>), if it has one.</summary>
    private IOperation? InitializerOf(ISymbol member)
    {
        var syntax = member.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken);
        EqualsValueClauseSyntax? clause = syntax switch
        {
            VariableDeclaratorSyntax declarator => declarator.Initializer,
            PropertyDeclarationSyntax property => property.Initializer,
            _ => null,
        };
        if (clause is null)
            return null;
        return ModelOf(clause).GetOperation(clause, cancellationToken) switch
        {
            IFieldInitializerOperation field => field.Value,
            IPropertyInitializerOperation property => property.Value,
            _ => null,
        };
    }

    /// <summary>The variable an operation denotes (for ref/out arguments), declaring 'out var' locals.</summary>
    private Variable? VariableOf(IOperation operation, Frame frame)
    {
        switch (operation)
        {
            case IDeclarationExpressionOperation { Expression: ILocalReferenceOperation local }:
                frame.Declare(local.Local, DefaultOf(local.Local.Type));
                return frame.Find(local.Local);
            case ILocalReferenceOperation local:
                return frame.Find(local.Local);
            case IParameterReferenceOperation parameter:
                return frame.Find(parameter.Parameter) ?? frame.Instance?.Find(parameter.Parameter);
            case IDiscardOperation:
                return new Variable(null);
            case IFieldReferenceOperation field when session.IsInSource(field.Field):
                if (field.Field.IsStatic) return StaticVariable(field.Field, frame);
                return (field.Instance is null ? frame.Instance : Evaluate(field.Instance, frame)) is InterpretedObject instance ? instance.GetOrAdd(field.Field) : null;
            default:
                return null;
        }
    }
}
