using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Assignments: simple, compound, '??=', increments and deconstructions, each through the StoragePlace its target
// denotes (a variable, an array or list slot, a property of the design or of a library or DSL object).
internal sealed partial class Interpreter
{
    private object? VisitSimpleAssignment(ISimpleAssignmentOperation assignment, Frame frame)
    {
        if (assignment.IsRef && assignment.Target is ILocalReferenceOperation refLocal)
        {
            BindRefLocal(refLocal.Local, assignment.Value, frame);
            return frame.Find(refLocal.Local)?.Value;
        }

        var place = PlaceOf(assignment.Target, frame);
        var value = CopyIfValue(Evaluate(assignment.Value, frame), assignment.Target.Type, frame);
        if (!place.IsKnown) return Skipped(assignment, frame); // a write to a place not known: any that it may be
        place.Set(value);
        return value;
    }

    private object? VisitCompoundAssignment(ICompoundAssignmentOperation assignment, Frame frame)
    {
        var place = PlaceOf(assignment.Target, frame);
        if (!place.IsKnown) return Skipped(assignment, frame);
        var current = ReadPlace(place, assignment.Target);
        var operand = Evaluate(assignment.Value, frame);
        object? result;
        if (Unknown.Is(current) || Unknown.Is(operand))
            result = Unknown.Value;
        else if (assignment.OperatorMethod is { } method)
            result = CallOperator(assignment, method, new[] { current, operand }, frame);
        else if (IsDelegate(assignment.Target.Type))
            result = DelegateArithmetic(assignment, assignment.OperatorKind, current, operand);
        else if (assignment.OperatorKind == BinaryOperatorKind.Add && assignment.Target.Type?.SpecialType == SpecialType.System_String)
            result = Concatenate(assignment, current, operand, assignment.Target.Type, SourceType(assignment.Value));
        else if (current is null || operand is null || assignment.Target.Type is null)
            result = Unsupported(assignment, "this compound assignment", "its operands are not known");
        else
            result = BinaryValue(assignment, assignment.OperatorKind, current, operand, assignment.Target.Type, assignment.IsChecked);
        place.Set(result);
        return result;
    }

    private object? VisitCoalesceAssignment(ICoalesceAssignmentOperation assignment, Frame frame)
    {
        var place = PlaceOf(assignment.Target, frame);
        if (!place.IsKnown) return Skipped(assignment, frame);
        var current = ReadPlace(place, assignment.Target);
        if (current is not null) return current;
        var value = Evaluate(assignment.Value, frame);
        place.Set(value);
        return value;
    }

    private object? VisitIncrement(IIncrementOrDecrementOperation increment, Frame frame) => IncrementOrDecrement(increment, frame);

    private object? VisitDecrement(IIncrementOrDecrementOperation decrement, Frame frame) => IncrementOrDecrement(decrement, frame);

    private object? VisitDeconstructionAssignment(IDeconstructionAssignmentOperation deconstruction, Frame frame)
    {
        // C# fixes where each part goes (the receivers, arrays and indices of the targets, left to right) before it
        // evaluates the right side: in (j, b[j]) = (2, 9) the element is b[j] with j as it was.
        var places = new Queue<StoragePlace>();
        PlacesOf(deconstruction.Target, places, frame);
        var value = Evaluate(deconstruction.Value, frame);
        Deconstruct(deconstruction.Target, value, frame, places);
        return value;
    }

    /// <summary>The places of a deconstruction's targets, left to right, as <see cref="Deconstruct"/> assigns them.</summary>
    private void PlacesOf(IOperation target, Queue<StoragePlace> places, Frame frame)
    {
        switch (target)
        {
            case IDeclarationExpressionOperation declaration:
                PlacesOf(declaration.Expression, places, frame);
                return;
            case ITupleOperation tuple:
                foreach (var element in tuple.Elements)
                    PlacesOf(element, places, frame);
                return;
            default:
                places.Enqueue(PlaceOf(target, frame));
                return;
        }
    }

    private object? IncrementOrDecrement(IIncrementOrDecrementOperation operation, Frame frame)
    {
        var place = PlaceOf(operation.Target, frame);
        if (!place.IsKnown) return Skipped(operation, frame);
        var before = ReadPlace(place, operation.Target);
        if (Unknown.Is(before)) return before;
        var kind = operation.Kind == OperationKind.Increment ? BinaryOperatorKind.Add : BinaryOperatorKind.Subtract;
        object? after;
        if (operation.OperatorMethod is { } method)
            after = CallOperator(operation, method, new[] { before }, frame);
        else if (before is null || operation.Target.Type is null)
            after = Unsupported(operation, "this increment", "its operand is not known");
        else
            after = BinaryValue(operation, kind, before, 1, operation.Target.Type, operation.IsChecked);
        place.Set(after);
        return operation.IsPostfix ? before : after;
    }

    /// <summary>What a compound assignment, '??=' or increment reads from its target; an unmade library-struct default is PW9001.</summary>
    private object? ReadPlace(StoragePlace place, IOperation target)
    {
        var value = place.Get();
        return value is UnmadeDefault unread ? ReadOfUnmadeDefault(target, unread) : value;
    }

    /// <summary>Assigns the parts of a tuple value to the targets of a deconstruction (<c>var (a, b) = ...</c>), to the
    /// <paramref name="places"/> found before the value was evaluated when given (else each target's place now).</summary>
    private void Deconstruct(IOperation target, object? value, Frame frame, Queue<StoragePlace>? places = null)
    {
        switch (target)
        {
            case IDeclarationExpressionOperation declaration:
                Deconstruct(declaration.Expression, value, frame, places);
                return;
            case ITupleOperation tuple:
                var items = value as TupleValue ?? DeconstructedParts(value);
                if (items is null && !Unknown.Is(value))
                {
                    Unsupported(target, "this deconstruction", "only tuples are deconstructed");
                    value = Unknown.Value;
                }

                for (var i = 0; i < tuple.Elements.Length; i++)
                    Deconstruct(tuple.Elements[i], items is not null && i < items.Items.Length ? items.Items[i] : Unknown.Value, frame, places);
                return;
            default:
                var place = places is not null ? places.Dequeue() : PlaceOf(target, frame);
                if (place.IsKnown) place.Set(value);
                else Poison(target, frame);
                return;
        }
    }

    /// <summary>The storage an assignment target denotes; a default (unknown) place when it cannot be written.</summary>
    private StoragePlace PlaceOf(IOperation target, Frame frame)
    {
        switch (target)
        {
            case ILocalReferenceOperation local:
                if (local.IsDeclaration || frame.Find(local.Local) is null)
                    frame.Declare(local.Local, DefaultOf(local.Local.Type, frame));
                else if (!frame.Declares(local.Local))
                    NoteEffect(); // a captured variable
                return PlaceOf(frame.Find(local.Local)!, local.Local);

            case IDeclarationExpressionOperation declaration:
                return PlaceOf(declaration.Expression, frame);

            case IDiscardOperation:
                return new StoragePlace(() => null, _ => { });

            case IParameterReferenceOperation or IFieldReferenceOperation when VariableOf(target, frame) is { } variable:
                return PlaceOf(variable, ReferencedSymbol(target));

            case IArrayElementReferenceOperation element when element.Indices.Length == 1:
                var array = Evaluate(element.ArrayReference, frame);
                var index = Evaluate(element.Indices[0], frame);
                if (Unknown.Is(array) || Unknown.Is(index)) return default;
                if (array is not object?[] items) break;
                if (!IsWholeNumber(index)) break; // broken code
                NoteStoreThrough(element.ArrayReference, frame);
                var i = SlotIndex(element, index!, items);
                if (i < 0) return default;
                if (!MayBeCovariant(items, element.ArrayReference.Type is IArrayTypeSymbol seenAs ? seenAs.ElementType : null, frame))
                    return new StoragePlace(() => items[i], v => items[i] = v);
                return new StoragePlace(() => items[i], v =>
                {
                    if (StoreFits(items, v, element, frame)) items[i] = v;
                });

            case IPropertyReferenceOperation property:
                return PropertyPlace(property, frame);
        }

        Unsupported(target, "this assignment target", "only locals, parameters, fields and properties of the design, array and list elements are assigned");
        return default;
    }

    private StoragePlace PropertyPlace(IPropertyReferenceOperation reference, Frame frame)
    {
        var property = reference.Property;
        var receiver = reference.Instance is null ? null : Evaluate(reference.Instance, frame);
        if (Unknown.Is(receiver)) return default;
        if (receiver is null && !property.IsStatic && ThroughReference(reference.Instance) is { } nullReceiver)
        {
            NullReference(reference, nullReceiver, "property " + Describe(property));
            return default;
        }

        if (receiver is List<object?> list && property.IsIndexer)
        {
            NoteStoreThrough(reference.Instance, frame);
            var index = Evaluate(reference.Arguments[0].Value, frame);
            if (Unknown.Is(index)) return default;
            var i = SlotIndex(reference, index!, list);
            return i < 0 ? default : new StoragePlace(() => list[i], v => list[i] = v);
        }

        if (receiver is InterpretedObject instance || (receiver is null && property.IsStatic && session.IsInSource(property)))
        {
            var interpretedObject = receiver as InterpretedObject;
            if (interpretedObject is not null && !ThroughBase(reference) && FindOverride(interpretedObject.Type, property) is { } overriding)
                property = overriding;
            if (IsAutoProperty(property))
            {
                NoteStoreInto(property.IsStatic ? null : interpretedObject);
                return PlaceOf(property.IsStatic ? StaticVariable(property, frame, reference.Syntax) : interpretedObject!.GetOrAdd(property), property);
            }

            if (property.SetMethod is { } setter && session.IsInSource(setter))
            {
                // An indexer's setter takes its index arguments, then the value. They are evaluated once, for both the
                // read and the write of a compound assignment (b[i++] += 1), as in C#.
                var (setterArguments, _) = Arguments(reference.Arguments, setter, frame, keepUnknown: true);
                return new StoragePlace(
                    () =>
                    {
                        if (property.GetMethod is not { } getter)
                            return CallGetter(reference, property, interpretedObject, frame);
                        Step(reference);
                        return InvokeUser(getter, interpretedObject, setterArguments!.Take(getter.Parameters.Length).ToArray(), new Variable?[getter.Parameters.Length], reference, frame);
                    },
                    v =>
                    {
                        var values = (object?[])setterArguments!.Clone();
                        values[values.Length - 1] = v;
                        InvokeUser(setter, interpretedObject, values, new Variable?[values.Length], reference, frame);
                    });
            }
        }
        else if (receiver is not null && !ClrTypes.IsDsl(property) && Library.IsPure(property) && property.SetMethod is { } librarySetter)
        {
            // A dictionary entry, a StringBuilder's Length, an element of a library collection.
            NoteStoreThrough(reference.Instance, frame);
            var (indexArguments, _) = Arguments(reference.Arguments, librarySetter, frame);
            if (indexArguments is null) return default;
            var getter = property.GetMethod;
            return new StoragePlace(
                () => getter is null ? Unknown.Value : CallClr(reference, getter, receiver, indexArguments.Take(getter.Parameters.Length).ToArray()),
                v =>
                {
                    if (Unknown.Is(v)) return;
                    // An array seen through IList<T> or IList checks the element type as its indexer does.
                    if (receiver is object?[] array && !StoreFits(array, v, reference, frame)) return;
                    var values = (object?[])indexArguments.Clone();
                    values[values.Length - 1] = v;
                    CallClr(reference, librarySetter, receiver, values);
                });
        }
        else if (receiver is not null && ClrTypes.IsDsl(property) && property.SetMethod is { } dslSetter)
        {
            // Object initializers of DSL objects: new Process { PassGateResistance = ... } calls the real init accessor.
            return new StoragePlace(() => null, v =>
            {
                if (!Unknown.Is(v)) CallClr(reference.Parent ?? reference, dslSetter, receiver, new[] { v });
            });
        }

        Unsupported(reference, "the assignment of " + Describe(property), "only properties of the design and of Phaseward objects being initialized are assigned");
        return default;
    }
}
