using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// What code the elaborator did not run may have written, found from the code itself: the fields, properties, events and
/// captured locals it assigns, directly or in any method, constructor, accessor, operator, lambda or static initializer of
/// the design it may call, and whether it may change a collection. Over-approximates (a virtual call stands for every
/// override, a delegate call for every delegate the design has made, ToString, Equals and the other members library code
/// calls by itself are always included): a value read later is never one the skipped code might have changed.
/// </summary>
internal sealed class SkippedEffects
{
    // Members that library code (string concatenation, collections, foreach, using, deconstruction) calls by itself.
    private static readonly HashSet<string> ImplicitlyCalled = new(StringComparer.Ordinal)
    {
        "ToString", "Equals", "GetHashCode", "CompareTo", "Compare", "Dispose", "Deconstruct", "GetEnumerator", "MoveNext", "Current", "Reset",
    };

    private readonly ElaborationSession session;
    private readonly CancellationToken cancellationToken;

    // What each method, lambda or initializer writes itself, and what it may call.
    private readonly Dictionary<object, Summary> summaries = new();

    // The whole effect of each skipped piece of code, with the count of delegates made when it was found.
    private readonly Dictionary<IOperation, (Effects Effects, int Delegates)> regions = new();

    // Every delegate target the design has made so far (lambdas and methods): what a delegate call may run.
    private readonly List<object> delegateTargets = new();
    private readonly HashSet<object> knownTargets = new();

    private Dictionary<string, List<ISymbol>>? membersByName;
    private List<object>? implicitCallees;

    public SkippedEffects(ElaborationSession session, CancellationToken cancellationToken)
    {
        this.session = session;
        this.cancellationToken = cancellationToken;
    }

    /// <summary>Notes a lambda or method made into a delegate: a delegate call skipped later may run it.</summary>
    public void NoteDelegate(IAnonymousFunctionOperation? lambda, IMethodSymbol method)
    {
        object target = lambda ?? (object)method.OriginalDefinition;
        if (knownTargets.Add(target))
            delegateTargets.Add(target);
    }

    /// <summary>What running <paramref name="skipped"/> may have written.</summary>
    public Effects Of(IOperation skipped)
    {
        if (regions.TryGetValue(skipped, out var known) && (!known.Effects.CallsDelegates || known.Delegates == delegateTargets.Count))
            return known.Effects;

        var written = new HashSet<ISymbol>(SymbolEqualityComparer.Default);
        var changesCollections = false;
        var callsDelegates = false;
        var seen = new HashSet<object>();
        var made = new List<object>();
        var pending = new Stack<object>();
        var first = Summarize(skipped, fresh: null, constructing: false);
        foreach (var callee in ImplicitCallees())
            pending.Push(callee);
        for (Summary? summary = first; ; summary = null)
        {
            if (summary is null)
            {
                if (pending.Count == 0)
                    break;
                var next = pending.Pop();
                if (!seen.Add(next))
                    continue;
                summary = SummaryOf(next);
            }

            written.UnionWith(summary.Writes);
            changesCollections |= summary.ChangesCollections;
            made.AddRange(summary.Delegates);
            foreach (var callee in summary.Callees)
                pending.Push(callee);
            if (summary.CallsDelegates && !callsDelegates)
            {
                callsDelegates = true;
                foreach (var target in delegateTargets)
                    pending.Push(target);
            }
        }

        // A delegate the skipped code would have made may be held as an unknown value and called later: its effects
        // then count (a delegate call skipped later includes it).
        foreach (var target in made)
            if (knownTargets.Add(target))
                delegateTargets.Add(target);
        var initialized = seen.OfType<TypeInitialization>().Where(t => t.Static).Select(t => t.Type).ToList();
        var effects = new Effects(written, changesCollections, callsDelegates, initialized);
        regions[skipped] = (effects, delegateTargets.Count);
        return effects;
    }

    private Summary SummaryOf(object callee)
    {
        if (summaries.TryGetValue(callee, out var summary))
            return summary;
        summary = callee switch
        {
            IAnonymousFunctionOperation lambda => Summarize(lambda.Body, lambda.Syntax, constructing: false),
            IMethodSymbol method => SummarizeMethod(method),
            TypeInitialization initialization => SummarizeInitialization(initialization),
            _ => Summary.Empty,
        };
        summaries[callee] = summary;
        return summary;
    }

    private Summary SummarizeMethod(IMethodSymbol method)
    {
        // A library method made into a delegate (list.Add as an Action): unless it can only read values, calling it may
        // change a collection the design holds.
        // (A member the compiler synthesizes, such as a record's Equals, is the compilation's own: summarized below.)
        if (!SymbolEqualityComparer.Default.Equals(method.ContainingAssembly, session.Compilation.Assembly))
            return Library.IsValueOnlyMethod(method) ? Summary.Empty : new Summary { ChangesCollections = true };
        var parts = new List<Summary>();
        var declarations = method.DeclaringSyntaxReferences.Select(r => r.GetSyntax(cancellationToken)).ToList();
        if (method.PartialImplementationPart is { } implementation)
            declarations.AddRange(implementation.DeclaringSyntaxReferences.Select(r => r.GetSyntax(cancellationToken)));
        var constructing = method.MethodKind == MethodKind.Constructor;
        foreach (var declaration in declarations)
        {
            // A record's or class's primary constructor: its initializers are the type's (TypeInitialization).
            if (declaration is TypeDeclarationSyntax)
                continue;
            if (session.Models.Get(declaration.SyntaxTree).GetOperation(declaration, cancellationToken) is { } body)
                parts.Add(Summarize(body, declaration, constructing));
        }

        return Summary.Combine(parts);
    }

    private Summary SummarizeInitialization(TypeInitialization initialization)
    {
        var parts = new List<Summary>();
        foreach (var member in initialization.Type.GetMembers())
        {
            if (member.IsStatic != initialization.Static)
                continue;
            switch (member)
            {
                case IFieldSymbol or IPropertySymbol:
                    var syntax = member.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken);
                    var clause = syntax switch
                    {
                        VariableDeclaratorSyntax declarator => declarator.Initializer,
                        PropertyDeclarationSyntax property => property.Initializer,
                        _ => null,
                    };
                    if (clause is not null && session.Models.Get(clause.SyntaxTree).GetOperation(clause, cancellationToken) is { } value)
                        parts.Add(Summarize(value, clause, constructing: !initialization.Static));
                    break;
                case IMethodSymbol { MethodKind: MethodKind.StaticConstructor or MethodKind.Constructor } constructor:
                    parts.Add(Summary.Calling(constructor));
                    break;
            }
        }

        // A class's base is built with it.
        if (!initialization.Static && initialization.Type.BaseType is { } baseType && session.IsInSource(baseType))
            parts.Add(Summary.Calling(new TypeInitialization(baseType.OriginalDefinition, isStatic: false)));
        return Summary.Combine(parts);
    }

    // The writes and calls in one body. Locals and parameters declared inside 'fresh' (a callee's own) are new variables
    // at every call and never taken; a constructor's or initializer's writes to the object being built are never taken.
    private Summary Summarize(IOperation body, SyntaxNode? fresh, bool constructing)
    {
        var summary = new Summary();
        foreach (var operation in body.DescendantsAndSelf())
        {
            cancellationToken.ThrowIfCancellationRequested();
            switch (operation)
            {
                case IAssignmentOperation assignment:
                    AddTarget(summary, assignment.Target, fresh, constructing);
                    if (assignment is ICompoundAssignmentOperation { OperatorMethod: { } compound })
                        AddCallee(summary, compound);
                    break;
                case IIncrementOrDecrementOperation increment:
                    AddTarget(summary, increment.Target, fresh, constructing);
                    if (increment.OperatorMethod is { } incrementOperator)
                        AddCallee(summary, incrementOperator);
                    break;
                case IArgumentOperation { Parameter.RefKind: RefKind.Ref or RefKind.Out } byReference:
                    AddTarget(summary, byReference.Value, fresh, constructing);
                    break;
                case IEventAssignmentOperation { EventReference: IEventReferenceOperation handlers }:
                    summary.Writes.Add(handlers.Event.OriginalDefinition);
                    break;
                case IInvocationOperation invocation:
                    AddInvocation(summary, invocation);
                    break;
                case IMethodReferenceOperation reference:
                    AddCallee(summary, reference.Method);
                    summary.Delegates.Add(reference.Method.OriginalDefinition);
                    break;
                case IAnonymousFunctionOperation lambda:
                    summary.Delegates.Add(lambda);
                    break;
                case IObjectCreationOperation { Constructor: { } constructor } when session.IsInSource(constructor.ContainingType):
                    AddCallee(summary, constructor);
                    summary.Callees.Add(new TypeInitialization(constructor.ContainingType.OriginalDefinition, isStatic: false));
                    summary.Callees.Add(new TypeInitialization(constructor.ContainingType.OriginalDefinition, isStatic: true));
                    break;
                case IPropertyReferenceOperation property:
                    AddStaticUse(summary, property.Property);
                    if (session.IsInSource(property.Property) && !Interpreter.IsAutoProperty(property.Property))
                    {
                        if (property.Property.GetMethod is { } getter) AddCallee(summary, getter);
                        if (property.Property.SetMethod is { } setter) AddCallee(summary, setter);
                    }

                    break;
                case IFieldReferenceOperation field:
                    AddStaticUse(summary, field.Field);
                    break;
                case IEventReferenceOperation eventReference:
                    AddStaticUse(summary, eventReference.Event);
                    break;
                case IBinaryOperation { OperatorMethod: { } binary }:
                    AddCallee(summary, binary);
                    break;
                case IUnaryOperation { OperatorMethod: { } unary }:
                    AddCallee(summary, unary);
                    break;
                case IConversionOperation { OperatorMethod: { } conversion }:
                    AddCallee(summary, conversion);
                    break;
            }
        }

        return summary;
    }

    private void AddInvocation(Summary summary, IInvocationOperation invocation)
    {
        var method = invocation.TargetMethod;
        if (method.MethodKind == MethodKind.DelegateInvoke)
        {
            summary.CallsDelegates = true;
            return;
        }

        if (session.IsInSource(method))
        {
            AddCallee(summary, method);
            AddStaticUse(summary, method);
            return;
        }

        // A library member that changes what it is called on (List.Add, StringBuilder.Append) or an array it is given
        // (Array.Sort, Array.Fill).
        if (!method.IsStatic ? Interpreter.Mutators.Contains(method.Name) && method.ContainingType?.SpecialType != SpecialType.System_String
                             : method.ContainingType?.SpecialType == SpecialType.System_Array)
            summary.ChangesCollections = true;
    }

    private void AddTarget(Summary summary, IOperation target, SyntaxNode? fresh, bool constructing)
    {
        switch (target)
        {
            case ILocalReferenceOperation local:
                if (!IsDeclaredIn(local.Local, fresh))
                    summary.Writes.Add(local.Local);
                break;
            case IParameterReferenceOperation parameter:
                if (!IsDeclaredIn(parameter.Parameter, fresh))
                    summary.Writes.Add(parameter.Parameter.OriginalDefinition);
                break;
            case IFieldReferenceOperation field:
                if (field.Field.ContainingType?.IsTupleType == true && field.Instance is { } tuple)
                    AddTarget(summary, tuple, fresh, constructing);
                else if (!IsObjectBeingMade(field.Instance, field.Field.IsStatic, constructing))
                    summary.Writes.Add(field.Field.OriginalDefinition);
                break;
            case IPropertyReferenceOperation property:
                if (!session.IsInSource(property.Property))
                    summary.ChangesCollections = true; // a library indexer or property: list[i] = x, builder.Length = 0
                else if (!Interpreter.IsAutoProperty(property.Property) || property.Property.IsIndexer)
                {
                    if (property.Property.SetMethod is { } setter)
                        AddCallee(summary, setter);
                }
                else if (!IsObjectBeingMade(property.Instance, property.Property.IsStatic, constructing))
                    summary.Writes.Add(property.Property.OriginalDefinition);
                break;
            case IArrayElementReferenceOperation or IImplicitIndexerReferenceOperation or IInlineArrayAccessOperation:
                summary.ChangesCollections = true;
                break;
            case IEventReferenceOperation handlers:
                summary.Writes.Add(handlers.Event.OriginalDefinition);
                break;
            case ITupleOperation parts:
                foreach (var element in parts.Elements)
                    AddTarget(summary, element, fresh, constructing);
                break;
            case IConditionalOperation choice:
                AddTarget(summary, choice.WhenTrue, fresh, constructing);
                if (choice.WhenFalse is not null)
                    AddTarget(summary, choice.WhenFalse, fresh, constructing);
                break;
            case IInstanceReferenceOperation self when self.Type is INamedTypeSymbol structType:
                // 'this = ...' in a struct: every field of it.
                foreach (var member in structType.GetMembers())
                    if (member is IFieldSymbol { IsStatic: false } or IPropertySymbol { IsStatic: false })
                        summary.Writes.Add(member.OriginalDefinition);
                break;
            case IDeclarationExpressionOperation or IDiscardOperation or IInvalidOperation:
                break;
            case IInvocationOperation call:
                // A ref return written through: any element, or any field the method reads, may be what it refers to.
                summary.ChangesCollections = true;
                if (session.IsInSource(call.TargetMethod))
                    foreach (var declaration in call.TargetMethod.DeclaringSyntaxReferences)
                        if (session.Models.Get(declaration.SyntaxTree).GetOperation(declaration.GetSyntax(cancellationToken), cancellationToken) is { } body)
                            foreach (var field in body.DescendantsAndSelf().OfType<IFieldReferenceOperation>())
                                summary.Writes.Add(field.Field.OriginalDefinition);
                break;
        }
    }

    // The object an initializer ('new T { P = v }', 'with') or a constructor is building: new, so no one else reads it.
    private static bool IsObjectBeingMade(IOperation? instance, bool isStatic, bool constructing)
        => !isStatic && (instance is IInstanceReferenceOperation { ReferenceKind: InstanceReferenceKind.ImplicitReceiver }
                         || (constructing && instance is null or IInstanceReferenceOperation { ReferenceKind: InstanceReferenceKind.ContainingTypeInstance }));

    private static bool IsDeclaredIn(ISymbol symbol, SyntaxNode? scope)
    {
        if (scope is null)
            return false;
        foreach (var reference in symbol.DeclaringSyntaxReferences)
            if (reference.SyntaxTree == scope.SyntaxTree && scope.Span.Contains(reference.Span))
                return true;
        return false;
    }

    // Using a static member of a type of the design may run the type's static initialization.
    private void AddStaticUse(Summary summary, ISymbol member)
    {
        if (member.IsStatic && member.ContainingType is { } type && session.IsInSource(type))
            summary.Callees.Add(new TypeInitialization(type.OriginalDefinition, isStatic: true));
    }

    // A method of the design, with every override and implementation a virtual or interface call may reach.
    private void AddCallee(Summary summary, IMethodSymbol method)
    {
        if (!session.IsInSource(method))
            return;
        summary.Callees.Add(method.OriginalDefinition);
        if (method.MethodKind == MethodKind.Constructor)
            summary.Callees.Add(new TypeInitialization(method.ContainingType.OriginalDefinition, isStatic: false));
        if (!(method.IsVirtual || method.IsAbstract || method.IsOverride || method.ContainingType?.TypeKind == TypeKind.Interface))
            return;
        var name = method.AssociatedSymbol?.Name ?? method.Name;
        foreach (var candidate in MembersNamed(name))
        {
            switch (candidate)
            {
                case IMethodSymbol other when other.Parameters.Length == method.Parameters.Length:
                    summary.Callees.Add(other.OriginalDefinition);
                    break;
                case IPropertySymbol property:
                    if (method.MethodKind == MethodKind.PropertyGet && property.GetMethod is { } getter)
                        summary.Callees.Add(getter.OriginalDefinition);
                    if (method.MethodKind == MethodKind.PropertySet && property.SetMethod is { } setter)
                        summary.Callees.Add(setter.OriginalDefinition);
                    break;
            }
        }
    }

    // The design's members with this name, explicit interface implementations ('IStage.Extra') included.
    private List<ISymbol> MembersNamed(string name)
    {
        membersByName ??= new Dictionary<string, List<ISymbol>>(StringComparer.Ordinal);
        if (!membersByName.TryGetValue(name, out var members))
        {
            members = session.Compilation.GetSymbolsWithName(n => n == name || n.EndsWith("." + name, StringComparison.Ordinal), SymbolFilter.Member, cancellationToken)
                .ToList();
            membersByName[name] = members;
        }

        return members;
    }

    private List<object> ImplicitCallees()
    {
        if (implicitCallees is null)
        {
            implicitCallees = new List<object>();
            foreach (var name in ImplicitlyCalled)
                foreach (var member in MembersNamed(name))
                {
                    if (member is IMethodSymbol method)
                        implicitCallees.Add(method.OriginalDefinition);
                    else if (member is IPropertySymbol { GetMethod: { } getter })
                        implicitCallees.Add(getter.OriginalDefinition);
                }
        }

        return implicitCallees;
    }

    /// <summary>What skipped code may have written.</summary>
    internal sealed class Effects
    {
        public Effects(HashSet<ISymbol> symbols, bool changesCollections, bool callsDelegates, List<INamedTypeSymbol> staticallyInitialized)
        {
            Symbols = symbols;
            ChangesCollections = changesCollections;
            CallsDelegates = callsDelegates;
            StaticallyInitialized = staticallyInitialized;
        }

        /// <summary>The design's types whose static initialization it may run (their generic definitions).</summary>
        public List<INamedTypeSymbol> StaticallyInitialized { get; }

        /// <summary>Fields, auto-properties, events, locals and parameters (their original definitions).</summary>
        public HashSet<ISymbol> Symbols { get; }

        /// <summary>Whether it may change a collection (a list, an array, a dictionary, a string builder).</summary>
        public bool ChangesCollections { get; }

        /// <summary>Whether it calls a delegate (so its effect grows with the delegates the design makes).</summary>
        public bool CallsDelegates { get; }
    }

    // The static or instance initialization of a type: its initializers and constructors.
    private sealed class TypeInitialization
    {
        public TypeInitialization(INamedTypeSymbol type, bool isStatic)
        {
            Type = type;
            Static = isStatic;
        }

        public INamedTypeSymbol Type { get; }

        public bool Static { get; }

        public override bool Equals(object? obj)
            => obj is TypeInitialization other && Static == other.Static && SymbolEqualityComparer.Default.Equals(Type, other.Type);

        public override int GetHashCode() => (SymbolEqualityComparer.Default.GetHashCode(Type) * 2) + (Static ? 1 : 0);
    }

    private sealed class Summary
    {
        public static readonly Summary Empty = new();

        public HashSet<ISymbol> Writes { get; } = new(SymbolEqualityComparer.Default);

        public List<object> Callees { get; } = new();

        public bool ChangesCollections { get; set; }

        public bool CallsDelegates { get; set; }

        /// <summary>The lambdas and methods it makes into delegates (the delegate value it would have made may be called later).</summary>
        public List<object> Delegates { get; } = new();

        public static Summary Calling(object callee)
        {
            var summary = new Summary();
            summary.Callees.Add(callee);
            return summary;
        }

        public static Summary Combine(List<Summary> parts)
        {
            var combined = new Summary();
            foreach (var part in parts)
            {
                combined.Writes.UnionWith(part.Writes);
                combined.Callees.AddRange(part.Callees);
                combined.ChangesCollections |= part.ChangesCollections;
                combined.CallsDelegates |= part.CallsDelegates;
                combined.Delegates.AddRange(part.Delegates);
            }

            return combined;
        }
    }
}
