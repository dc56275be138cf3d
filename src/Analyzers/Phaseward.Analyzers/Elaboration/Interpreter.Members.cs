using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Reading members, elements and indices: fields and properties of the design's objects, of its static state (run
// through the type's static initialization first, as C# does), of the DSL and of the pure library; array and list
// elements; '^i' and ranges.
internal sealed partial class Interpreter
{

    private object? VisitFieldReference(IFieldReferenceOperation field, Frame frame)
    {
        var symbol = field.Field;
        if (symbol.ContainingType?.IsTupleType == true)
        {
            var tuple = field.Instance is null ? null : Evaluate(field.Instance, frame);
            if (Unknown.Is(tuple)) return tuple;
            return tuple is TupleValue t && TupleIndex(symbol) is { } index && index < t.Items.Length
                ? t.Items[index]
                : Unsupported(field, "tuple element " + Describe(symbol), "tuples of more than seven elements are outside the subset");
        }

        if (!ClrTypes.IsDsl(symbol) && !session.IsInSource(symbol) && Library.IsPure(symbol))
            return ReadLibraryField(field, symbol, frame);

        if (ClrTypes.IsDsl(symbol) && symbol.IsStatic)
        {
            var type = symbol.ContainingType is null ? null : ClrTypes.Resolve(symbol.ContainingType);
            var info = type?.GetField(symbol.Name, System.Reflection.BindingFlags.Public | System.Reflection.BindingFlags.NonPublic | System.Reflection.BindingFlags.Static);
            return info is null ? Unsupported(field, "field " + Describe(symbol), "it was not found in the Phaseward assembly") : FromClr(info.GetValue(null));
        }

        if (!session.IsInSource(symbol))
            return Unsupported(field, "field " + Describe(symbol), "only fields declared in this compilation or the Phaseward DSL are read");

        if (symbol.IsStatic)
            return Read(StaticVariable(symbol, frame, field.Syntax), symbol);

        var owner = field.Instance is null ? frame.Instance : Evaluate(field.Instance, frame);
        if (Unknown.Is(owner)) return owner;
        if (owner is null && ThroughReference(field.Instance) is { } nullOwner)
            return NullReference(field, nullOwner, "field " + Describe(symbol));
        if (owner is InterpretedObject instance && instance.Find(symbol) is { } stored)
            return Read(stored, symbol);
        return Unsupported(field, "field " + Describe(symbol), owner is InterpretedObject
            ? "it was not initialized by the elaborator"
            : "only fields of objects the design's code made are read");
    }

    private static int? TupleIndex(IFieldSymbol field)
    {
        var name = (field.CorrespondingTupleField ?? field).Name;
        return name.StartsWith("Item", StringComparison.Ordinal) && int.TryParse(name.Substring(4), NumberStyles.None, CultureInfo.InvariantCulture, out var n)
            ? n - 1
            : null;
    }

    private object? VisitPropertyReference(IPropertyReferenceOperation reference, Frame frame)
    {
        var property = reference.Property;
        var receiver = reference.Instance is null ? null : Evaluate(reference.Instance, frame);
        if (Unknown.Is(receiver)) return Skipped(reference, frame); // a getter may run
        if (receiver is null && !property.IsStatic && ThroughReference(reference.Instance) is { } nullReceiver)
            return NullReference(reference, nullReceiver, "property " + Describe(property));
        if (reference.ConstrainedToType is { } constrained && property.IsStatic)
        {
            if (StaticImplementation(constrained, property, frame) is not IPropertySymbol implementation)
                return Unsupported(reference, "property " + Describe(property), "what the type parameter stands for is not known here");
            property = implementation;
        }

        switch (receiver)
        {
            case object?[] array when property.Name == "Length":
                return array.Length;
            case List<object?> list when property.Name == "Count":
                return list.Count;
            case List<object?> list when property.IsIndexer:
                var index = Evaluate(reference.Arguments[0].Value, frame);
                if (Unknown.Is(index)) return index;
                var i = SlotIndex(reference, index!, list);
                return i < 0 ? Unknown.Value : list[i];
            case string text when property.Name == "Length":
                return text.Length;
            case InterpretedObject instance:
                return ReadDesignProperty(reference, instance, frame);
            case TypeValue type:
                return property.Name switch
                {
                    "Name" => type.Name,
                    "Namespace" => type.Namespace,
                    "FullName" when type.HasPlainFullName => type.ToString(),
                    _ => Unsupported(reference, "property " + Describe(property), "of a type only its Name, Namespace and FullName (when it is not generic) are read: the rest is reflection"),
                };
        }

        if (session.IsInSource(property))
        {
            if (property.IsStatic)
                return IsAutoProperty(property) ? Read(StaticVariable(property, frame, reference.Syntax), property) : CallGetter(reference, property, null, frame);
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
        if (!ThroughBase(reference) && FindOverride(instance.Type, property) is { } overriding)
            property = overriding;
        if (ClrTypes.IsDsl(property))
            return property.Name == nameof(Design.Name)
                ? DesignName
                : Unsupported(reference, "property " + Describe(property), "the design's inherited Phaseward members are not read at compile time");
        if (!session.IsInSource(property))
            return Unsupported(reference, "property " + Describe(property), "it is not declared in this compilation");
        if (IsAutoProperty(property))
            return instance.Find(property) is { } stored
                ? Read(stored, property)
                : Unsupported(reference, "property " + Describe(property), "it was not initialized by the elaborator");
        return CallGetter(reference, property, instance, frame);
    }

    private object? CallGetter(IPropertyReferenceOperation reference, IPropertySymbol property, InterpretedObject? instance, Frame frame)
    {
        if (property.GetMethod is not { } getter)
            return Unsupported(reference, "property " + Describe(property), "it has no getter");
        Step(reference);
        var (arguments, references) = Arguments(reference.Arguments, getter, frame);
        if (arguments is null || property.IsStatic && !InitializeForUse(StaticOwner(property.ContainingType, frame), reference.Syntax))
            return Unknown.Value;
        return InvokeUser(getter, instance, arguments, references, reference, frame);
    }

    /// <summary>
    /// A static abstract or virtual interface member reached through a type parameter (<c>T.Prefix</c>, <c>T.Make()</c>):
    /// the implementation of the type the parameter stands for here (the interface's own body for a static virtual one it
    /// does not implement). Null when what the parameter stands for is not known.
    /// </summary>
    private static ISymbol? StaticImplementation(ITypeSymbol constrained, ISymbol member, Frame frame)
    {
        var actual = constrained is ITypeParameterSymbol parameter ? frame.TypeArgumentOf(parameter) : constrained;
        if (actual is null or ITypeParameterSymbol || member.ContainingType is not { } contract)
            return null;
        foreach (var implemented in actual.AllInterfaces)
        {
            if (!SymbolEqualityComparer.Default.Equals(implemented.OriginalDefinition, contract.OriginalDefinition))
                continue;
            var declared = implemented.GetMembers(member.Name).FirstOrDefault(m => SymbolEqualityComparer.Default.Equals(m.OriginalDefinition, member.OriginalDefinition));
            if (declared is not null && actual.FindImplementationForInterfaceMember(declared) is { } implementation)
                return implementation;
            return declared is { IsAbstract: false } ? declared : null;
        }

        return member.IsAbstract ? null : member;
    }

    /// <summary><c>base.P</c> or <c>base[i]</c>: the base class's own property, never an override (which would call itself).</summary>
    private static bool ThroughBase(IPropertyReferenceOperation reference) => reference.Instance?.Syntax is BaseExpressionSyntax;

    /// <summary>A property that stores its value (auto-property, or a record's positional property).</summary>
    internal static bool IsAutoProperty(IPropertySymbol property)
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
    /// <remarks>
    /// A generic type has static storage per constructed type (<c>Holder&lt;int&gt;.Value</c> is not
    /// <c>Holder&lt;long&gt;.Value</c>): inside its own code, its type parameters are resolved through the frame.
    /// </remarks>
    private Variable StaticVariable(ISymbol member, Frame frame, SyntaxNode site)
    {
        var type = member.ContainingType is { } containing ? StaticOwner(containing, frame) : null;
        var key = type is null || SymbolEqualityComparer.Default.Equals(type, type.OriginalDefinition)
            ? member.OriginalDefinition
            : type.GetMembers(member.Name).FirstOrDefault(m => SymbolEqualityComparer.Default.Equals(m.OriginalDefinition, member.OriginalDefinition)) ?? member.OriginalDefinition;
        if (statics.TryGetValue(key, out var variable))
            return variable;
        var firstUse = type is not null && !initializedTypes.Contains(type);
        if (type is not null)
        {
            InitializeStatics(type);
            // A type whose initialization threw throws again at every use, as in C#; its statics are never read.
            if (failedTypes.TryGetValue(type, out var failure))
            {
                Raise(site, TypeInitializationFailure(type, failure));
                return new Variable(Unknown.Value);
            }
        }

        if (!statics.TryGetValue(key, out variable))
            statics[key] = variable = new Variable(DefaultOf(key is IFieldSymbol f ? f.Type : ((IPropertySymbol)key).Type));
        if (firstUse && type!.IsGenericType && skippedWrites.Any)
            MarkSkippedStatics(type);
        return variable;
    }

    /// <summary>
    /// A generic type's construction first used after skipped code that may have written its statics: which construction
    /// the skipped code used is not known (so it was not initialized then), and it may be this one. Its statics that
    /// the skipped code may have written are stale, never read as the initializer left them.
    /// </summary>
    private void MarkSkippedStatics(INamedTypeSymbol construction)
    {
        foreach (var member in construction.GetMembers())
            if (member.IsStatic && member is IFieldSymbol or IPropertySymbol && skippedWrites.MayHaveWritten(member)
                && statics.TryGetValue(member, out var stale))
                stale.MarkStale();
    }

    /// <summary>The type whose static storage a member lives in: its generic definition's type arguments resolved, else the definition.</summary>
    private INamedTypeSymbol StaticOwner(INamedTypeSymbol type, Frame frame)
        => !type.IsGenericType ? type.OriginalDefinition : ConstructedIn(type, frame) ?? type.OriginalDefinition;

    /// <summary>A generic type with its type parameters resolved through the frame (see <see cref="ResolvedIn"/>); null
    /// when one is not known there.</summary>
    private INamedTypeSymbol? ConstructedIn(INamedTypeSymbol type, Frame frame) => ResolvedIn(type, frame) as INamedTypeSymbol;

    /// <summary>
    /// A type with every type parameter in it resolved through the frame, wherever it stands: <c>Box&lt;T&gt;</c> in a
    /// call with T = int is <c>Box&lt;int&gt;</c>, <c>Slot&lt;List&lt;T&gt;&gt;</c> is <c>Slot&lt;List&lt;int&gt;&gt;</c>,
    /// <c>T[]</c> is <c>int[]</c>, and <c>Outer&lt;T&gt;.Inner</c> is <c>Outer&lt;int&gt;.Inner</c> (a type nested in a
    /// generic type has its own statics per construction too). Null when one is not known there.
    /// </summary>
    private ITypeSymbol? ResolvedIn(ITypeSymbol type, Frame frame)
    {
        switch (type)
        {
            case ITypeParameterSymbol parameter:
                return frame.TypeArgumentOf(parameter) is { } argument && !MentionsTypeParameter(argument) ? argument : null;
            case IArrayTypeSymbol array when MentionsTypeParameter(array):
                return ResolvedIn(array.ElementType, frame) is { } element ? session.Compilation.CreateArrayTypeSymbol(element, array.Rank) : null;
            case INamedTypeSymbol named when MentionsTypeParameter(named):
                var resolved = named.OriginalDefinition;
                if (named.ContainingType is { IsGenericType: true } containing)
                {
                    if (ConstructedIn(containing, frame) is not { } outer)
                        return null;
                    resolved = outer.GetTypeMembers(named.Name, named.Arity)
                        .FirstOrDefault(t => SymbolEqualityComparer.Default.Equals(t.OriginalDefinition, named.OriginalDefinition));
                    if (resolved is null)
                        return null;
                }

                if (named.Arity == 0)
                    return resolved;
                var arguments = new ITypeSymbol[named.TypeArguments.Length];
                for (var i = 0; i < arguments.Length; i++)
                    if ((arguments[i] = ResolvedIn(named.TypeArguments[i], frame)!) is null)
                        return null;
                return resolved.Construct(arguments);
            default:
                return type;
        }
    }

    // True when a type parameter stands anywhere in the type: its type arguments, its containing types', an array's element.
    private static bool MentionsTypeParameter(ITypeSymbol type) => type switch
    {
        ITypeParameterSymbol => true,
        IArrayTypeSymbol array => MentionsTypeParameter(array.ElementType),
        INamedTypeSymbol named => named.TypeArguments.Any(MentionsTypeParameter) || (named.ContainingType is { } containing && MentionsTypeParameter(containing)),
        _ => false,
    };

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
            statics[SymbolEqualityComparer.Default.Equals(type, type.OriginalDefinition) ? stored.OriginalDefinition : stored] = variable;
            storage.Add((stored, variable));
        }

        // The initializers and the static constructor see the type's own type arguments (default(T), Holder<T>.Value).
        // A nested type sees its containing types' type arguments as well.
        Dictionary<ITypeParameterSymbol, ITypeSymbol>? typeArguments = null;
        for (var current = type; current is not null; current = current.ContainingType)
        {
            if (SymbolEqualityComparer.Default.Equals(current, current.OriginalDefinition))
                continue;
            var parameters = current.OriginalDefinition.TypeParameters;
            for (var i = 0; i < parameters.Length && i < current.TypeArguments.Length; i++)
                (typeArguments ??= new(SymbolEqualityComparer.Default))[parameters[i]] = current.TypeArguments[i];
        }

        // An exception the design catches (the first use was inside a try) leaves the type failed: C# wraps it in a
        // TypeInitializationException, and every later use throws that again.
        try
        {
            var frame = new Frame(null, null, null) { TypeArguments = typeArguments };
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
                    Unsupported(declaration, "the static constructor of " + Describe(type), "its body could not be read");
                    continue;
                }

                var statements = (IOperation?)body.BlockBody ?? body.ExpressionBody;
                if (statements is not null)
                    Execute(statements, new Frame(constructor, null, null) { TypeArguments = typeArguments });
            }
        }
        catch (DesignException e)
        {
            foreach (var (member, _) in storage)
                statics.Remove(SymbolEqualityComparer.Default.Equals(type, type.OriginalDefinition) ? member.OriginalDefinition : member);
            failedTypes[type] = e.Thrown as Exception;
            throw new DesignException(TypeInitializationFailure(type, e.Thrown as Exception), e.Site);
        }
    }

    /// <summary>
    /// A static method or property of the type is called, or an object of it made: a type with a static constructor
    /// (not beforefieldinit) is initialized first, as C# guarantees. One without is initialized at the first read of
    /// one of its static fields (<see cref="StaticVariable"/>), as the .NET run does. False when its initialization
    /// failed earlier: the TypeInitializationException is raised again.
    /// </summary>
    private bool InitializeForUse(INamedTypeSymbol type, SyntaxNode site)
    {
        if (!session.IsInSource(type) || !type.StaticConstructors.Any(c => !c.IsImplicitlyDeclared))
            return true;
        InitializeStatics(type);
        if (!failedTypes.TryGetValue(type, out var failure))
            return true;
        Raise(site, TypeInitializationFailure(type, failure));
        return false;
    }

    private static TypeInitializationException TypeInitializationFailure(INamedTypeSymbol type, Exception? inner)
        => new(type.ToDisplayString(), inner);

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

    private object? VisitArrayElementReference(IArrayElementReferenceOperation element, Frame frame)
    {
        var array = Evaluate(element.ArrayReference, frame);
        if (Unknown.Is(array)) return Skipped(element, frame);
        if (element.Indices.Length != 1)
            return Unsupported(element, "a multi-dimensional array", "only one-dimensional arrays are elaborated");
        var index = Evaluate(element.Indices[0], frame);
        if (Unknown.Is(index)) return index;
        if (array is null)
            return NullReference(element, element.ArrayReference, "an element");
        if (array is not object?[] items)
            return Unsupported(element, "this array", "it does not come from the design's code");
        if (index is IndexValue or RangeValue)
            return Indexed(element, items, index);
        // In code that does not compile yet the index can be a value of another type (a net, a string).
        if (!IsWholeNumber(index))
            return Unsupported(element, "this array index", "it is not a whole number");
        var i = SlotIndex(element, index!, items);
        return i < 0 ? Unknown.Value : items[i];
    }

    private static bool IsWholeNumber(object? value) => value is int or long or short or byte or sbyte or ushort or uint or ulong or char;

    /// <summary>
    /// The slot a whole-number index denotes in an array or list; -1 when it is outside, reported as what the run would
    /// throw (IndexOutOfRangeException for an array, ArgumentOutOfRangeException for a list).
    /// </summary>
    private int SlotIndex(IOperation site, object index, System.Collections.IList items)
    {
        var i = System.Convert.ToInt32(index, CultureInfo.InvariantCulture);
        if (i >= 0 && i < items.Count)
            return i;
        var isArray = items is object?[];
        Throws(site.Syntax, isArray
            ? $"IndexOutOfRangeException: index {i} is outside the bounds of an array of length {items.Count}"
            : $"ArgumentOutOfRangeException: index {i} is outside a list of {items.Count} elements");
        return -1;
    }

    /// <summary><c>list[^1]</c>, <c>text[1..3]</c>: an Index or Range on a type that only has a Count/Length and an int indexer.</summary>
    private object? VisitImplicitIndexerReference(IImplicitIndexerReferenceOperation reference, Frame frame)
    {
        var instance = Evaluate(reference.Instance, frame);
        var argument = Evaluate(reference.Argument, frame);
        if (Unknown.Is(instance) || Unknown.Is(argument)) return Unknown.Value;
        System.Collections.IList? items = instance switch
        {
            object?[] array => array,
            List<object?> list => list,
            _ => null,
        };
        if (instance is string text)
        {
            if (argument is IndexValue at && at.OffsetIn(text.Length) is var i && i >= 0 && i < text.Length) return text[i];
            if (argument is RangeValue span && Bounds(span, text.Length) is var (start, length) && length >= 0) return text.Substring(start, length);
            return ThrowsUnknown(reference, "ArgumentOutOfRangeException: the index or range is outside a string of length " + text.Length);
        }

        return items is null ? Unsupported(reference, "this index", "only arrays, lists and strings are indexed from the end or by range") : Indexed(reference, items, argument);
    }

    private object? VisitRange(IRangeOperation range, Frame frame)
    {
        var start = range.LeftOperand is null ? new IndexValue(0, false) : Evaluate(range.LeftOperand, frame);
        var end = range.RightOperand is null ? new IndexValue(0, true) : Evaluate(range.RightOperand, frame);
        if (Unknown.Is(start) || Unknown.Is(end)) return Unknown.Value;
        return start is IndexValue from && end is IndexValue to ? new RangeValue(from, to) : Unsupported(range, "this range", "its ends are not indices");
    }

    private object? Indexed(IOperation site, System.Collections.IList items, object? index)
    {
        switch (index)
        {
            case IndexValue at when at.OffsetIn(items.Count) is var i && i >= 0 && i < items.Count:
                return items[i];
            case RangeValue span when Bounds(span, items.Count) is var (start, length) && length >= 0 && start >= 0 && start + length <= items.Count:
                var slice = new object?[length];
                for (var k = 0; k < length; k++) slice[k] = items[start + k];
                ChargeMemory(site, 8L * length);
                return items is List<object?> ? new List<object?>(slice) : slice;
            default:
                return ThrowsUnknown(site, $"IndexOutOfRangeException: the index or range is outside a collection of {items.Count} elements");
        }
    }

    private static (int Start, int Length) Bounds(RangeValue range, int count)
    {
        var start = range.Start.OffsetIn(count);
        return (start, range.End.OffsetIn(count) - start);
    }
}
