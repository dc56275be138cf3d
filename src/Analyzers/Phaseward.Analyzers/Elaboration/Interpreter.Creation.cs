using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Object creation, arrays, collection expressions, tuples, 'with'. Arrays are object?[] and lists List<object?> whatever their element type,
// so they can hold Unknown elements; they become typed .NET collections only when passed to the DSL.
internal sealed partial class Interpreter
{
    private object? VisitObjectCreation(IObjectCreationOperation creation, Frame frame)
    {
        var type = creation.Type as INamedTypeSymbol;
        if (type is not null && session.IsInSource(type) && creation.Constructor is { } sourceConstructor)
            return CreateObject(creation, ConstructedIn(type, frame) ?? type, sourceConstructor, frame);

        if (type is not null && !ClrTypes.IsDsl(type) && creation.Constructor is { } libraryConstructor && Library.IsPure(libraryConstructor))
            return CreateLibraryObject(creation, libraryConstructor, frame);

        if (type is null || !ClrTypes.IsDsl(type) || creation.Constructor is not { } constructor)
            return Unsupported(creation, "the creation of " + (type is null ? "this object" : Describe(type)),
                "it is outside what compile-time elaboration runs (only the Phaseward DSL, types of this compilation and pure library types)");

        Step(creation);
        object? made;
        if (constructor.Parameters.Length == 0 && type.IsValueType)
        {
            made = ClrTypes.Resolve(type) is { } clr ? Activator.CreateInstance(clr) : null;
        }
        else
        {
            var (arguments, _) = Arguments(creation.Arguments, constructor, frame);
            if (arguments is null) return Unknown.Value;
            made = CallClr(creation, constructor, null, arguments);
        }

        if (made is null || Unknown.Is(made))
            return made ?? Unsupported(creation, "the creation of " + Describe(type), "the type was not found in the Phaseward assembly");
        return Initialize(creation, made, frame);
    }

    /// <summary><c>new T()</c> in generic code: an object of the design's type T stands for, or a value type's default.</summary>
    private object? VisitTypeParameterObjectCreation(ITypeParameterObjectCreationOperation creation, Frame frame)
    {
        var stands = creation.Type is ITypeParameterSymbol parameter ? frame.TypeArgumentOf(parameter) : null;
        if (stands is null)
            return Unsupported(creation, "new " + creation.Type, "the type argument it stands for is not known where the generic code is interpreted");
        if (creation.Initializer is null && stands.IsValueType && !session.IsInSource(stands))
            return DefaultOf(stands, frame);
        if (creation.Initializer is not null || stands is not INamedTypeSymbol type || !session.IsInSource(type)
            || type.InstanceConstructors.FirstOrDefault(c => c.Parameters.Length == 0) is not { } constructor)
            return Unsupported(creation, "new " + creation.Type + " (here " + stands.ToDisplayString() + ")",
                "only the design's own types, without an initializer, are made through a type parameter");
        Step(creation);
        return MakeObject(creation, type, constructor, System.Array.Empty<object?>());
    }

    /// <summary>Runs an object or collection initializer (<c>{ P = v }</c>, <c>{ a, b }</c>) on a new object.</summary>
    private object? Initialize(IObjectCreationOperation creation, object made, Frame frame)
        => creation.Initializer is null || FillIn(made, creation.Initializer, frame) ? made : Unknown.Value;

    /// <summary>Runs the assignments and Add calls of an initializer on <paramref name="target"/> (what they write into
    /// with no receiver written out); false when one of them could not be evaluated.</summary>
    private bool FillIn(object target, IObjectOrCollectionInitializerOperation initializer, Frame frame)
    {
        implicitReceivers.Push(target);
        try
        {
            foreach (var part in initializer.Initializers)
                if (Unknown.Is(Evaluate(part, frame)))
                    return false;
            return true;
        }
        finally
        {
            implicitReceivers.Pop();
        }
    }

    /// <summary>The most elements .NET gives a one-dimensional array (Array.MaxLength, not in netstandard2.0).</summary>
    private const long MaxArrayLength = 0x7FFFFFC7;

    private object? VisitArrayCreation(IArrayCreationOperation creation, Frame frame)
    {
        if (creation.DimensionSizes.Length != 1)
            return Unsupported(creation, "a multi-dimensional array", "only one-dimensional arrays are elaborated");
        var size = Evaluate(creation.DimensionSizes[0], frame);
        if (Unknown.Is(size)) return Skipped(creation, frame);
        // The size may be a long or ulong (C# allows them): charged to the memory budget before anything is made.
        var length = size is ulong huge ? (huge > long.MaxValue ? long.MaxValue : (long)huge) : System.Convert.ToInt64(size, CultureInfo.InvariantCulture);
        if (length < 0)
        {
            Throws(creation.Syntax, $"OverflowException: an array cannot have a negative length ({length})");
            return Unknown.Value;
        }

        Step(creation);
        ChargeMemory(creation, length > long.MaxValue / 8 ? long.MaxValue : 8L * length);
        if (length > MaxArrayLength)
        {
            Throws(creation.Syntax, $"OutOfMemoryException: an array of {length} elements is larger than .NET makes ({MaxArrayLength})");
            return Unknown.Value;
        }

        var element = ((IArrayTypeSymbol)creation.Type!).ElementType;
        var items = new object?[length];
        var initial = DefaultOf(element, frame);
        if (initial is InterpretedObject && length > 0)
        {
            // Elements of a struct type are values: one default each, not one shared by every slot.
            items[0] = initial;
            for (var i = 1; i < length; i++)
                items[i] = CopyIfValue(initial, element, frame);
        }
        else
        {
            for (var i = 0; i < length; i++)
                items[i] = initial;
        }
        if (creation.Initializer is { } initializer)
            for (var i = 0; i < initializer.ElementValues.Length && i < length; i++)
                items[i] = Evaluate(initializer.ElementValues[i], frame);
        return Typed(items, element, frame);
    }

    private object? VisitCollectionExpression(ICollectionExpressionOperation collection, Frame frame)
    {
        var items = new List<object?>();
        foreach (var element in collection.Elements)
        {
            if (element is ISpreadOperation spread)
            {
                var source = Evaluate(spread.Operand, frame);
                if (Unknown.Is(source)) return Skipped(collection, frame);
                if (source is object?[] array) items.AddRange(array);
                else if (source is List<object?> list) items.AddRange(list);
                else if (SpreadItems(spread, source) is { } spreadItems) items.AddRange(spreadItems);
                else return Unknown.Value;
                continue;
            }

            items.Add(Evaluate(element, frame));
        }

        Step(collection);
        ChargeMemory(collection, 8L * items.Count);
        return collection.Type switch
        {
            IArrayTypeSymbol arrayType => Typed(items.ToArray(), arrayType.ElementType, frame),
            // C# makes a List<T> for a List<T>, IList<T> or ICollection<T>; for the read-only interfaces a type of its own choosing.
            INamedTypeSymbol named when IsList(named) || IsMutableListInterface(named) => TypedIfConstructed(items, ListOf(named), frame),
            INamedTypeSymbol named when IsListInterface(named) => items,
            _ => Unsupported(collection, "this collection expression", "only arrays and List<T> are built from collection expressions"),
        };
    }

    /// <summary>
    /// The values a spread element (<c>[.. source]</c>) enumerates that is not an array or list: an iterator, a LINQ
    /// sequence, a set, a string, a sequence of the design's own type. Null when they are not known (reported).
    /// </summary>
    private IEnumerable<object?>? SpreadItems(ISpreadOperation spread, object? source)
    {
        switch (source)
        {
            case InterpretedObject sequence when GetEnumeratorOf(sequence.Type) is { } getEnumerator:
                return EnumeratedForLibrary(sequence, getEnumerator);
            case System.Collections.IEnumerable sequence:
                try
                {
                    return Materialize(sequence);
                }
                catch (UnknownValueException e)
                {
                    UnknownFrom(e, spread);
                    return null;
                }

            default:
                Unsupported(spread, "this spread element", "it is not a sequence the elaborator enumerates");
                return null;
        }
    }

    private object? VisitTuple(ITupleOperation tuple, Frame frame)
    {
        var items = new object?[tuple.Elements.Length];
        for (var i = 0; i < items.Length; i++)
            items[i] = Evaluate(tuple.Elements[i], frame);
        return new TupleValue(items);
    }

    private static bool IsList(INamedTypeSymbol type) => ClrTypes.MetadataName(type.OriginalDefinition) == "System.Collections.Generic.List`1";

    private static bool IsMutableListInterface(INamedTypeSymbol type) => ClrTypes.MetadataName(type.OriginalDefinition) is
        "System.Collections.Generic.IList`1" or "System.Collections.Generic.ICollection`1";

    // List<E> for a collection expression's target type with element type E.
    private INamedTypeSymbol? ListOf(INamedTypeSymbol target)
        => session.Compilation.GetTypeByMetadataName("System.Collections.Generic.List`1") is { } list ? list.Construct(target.TypeArguments[0]) : null;

    private static bool IsListInterface(INamedTypeSymbol type) => ClrTypes.MetadataName(type.OriginalDefinition) is
        "System.Collections.Generic.IList`1" or "System.Collections.Generic.IReadOnlyList`1" or "System.Collections.Generic.IEnumerable`1"
        or "System.Collections.Generic.ICollection`1" or "System.Collections.Generic.IReadOnlyCollection`1";

    private object? VisitObjectOrCollectionInitializer(IObjectOrCollectionInitializerOperation initializer, Frame frame)
        => Unsupported(initializer, "this initializer", "it is only interpreted as part of an object creation");

    /// <summary>A nested initializer, <c>new Outer { Inner = { X = 1 }, Items = { a, b } }</c>: it fills in the object the
    /// member already holds (it makes none).</summary>
    private object? VisitMemberInitializer(IMemberInitializerOperation nested, Frame frame)
    {
        var member = Evaluate(nested.InitializedMember, frame);
        if (Unknown.Is(member)) return Skipped(nested.Initializer, frame);
        if (member is null)
            return NullReference(nested, nested.InitializedMember, "its initializer") ?? Unknown.Value;
        return FillIn(member, nested.Initializer, frame) ? member : Unknown.Value;
    }

    private object? VisitAnonymousObjectCreation(IAnonymousObjectCreationOperation creation, Frame frame)
        => Unsupported(creation, "an anonymous object", "anonymous types are outside the subset the elaborator interprets");

    /// <summary><c>value with { P = ... }</c>: a copy, then the initializer on the copy.</summary>
    private object? VisitWith(IWithOperation with, Frame frame)
    {
        var original = Evaluate(with.Operand, frame);
        if (Unknown.Is(original)) return Skipped(with, frame);
        if (original is not InterpretedObject source)
            return Unsupported(with, "this 'with' expression", "only records and structs of this compilation are copied with 'with'");
        var copy = source.Copy();
        return FillIn(copy, with.Initializer, frame) ? copy : Unknown.Value;
    }
}
