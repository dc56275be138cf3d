using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// What objects of the design's own types mean: ToString, Equals and GetHashCode (the design's overrides interpreted,
// or the members C# generates for records and structs), struct copies, record deconstruction, and the members a user
// type inherits from object.
internal sealed partial class Interpreter : IObjectSemantics
{
    public string TextOf(InterpretedObject value)
    {
        if (UserOverride(value.Type, "ToString", 0) is { } toString)
            return InvokeForLibrary(toString, value, Array.Empty<object?>()) is string text ? text : throw new UnknownValueException();
        if (value.Type.IsRecord)
        {
            // As the generated ToString: "Name { ", then PrintMembers (the design's own, if it writes one), then "}".
            var text = new StringBuilder(value.Type.Name).Append(" { ");
            if (PrintMembers(value, value.Type, text))
                text.Append(' ');
            return text.Append('}').ToString();
        }

        // object.ToString prints the run-time type as Type.ToString does: Ns.Box`1[System.Int32], Ns.Outer+Inner.
        return new TypeValue(value.Type).ToString();
    }

    public bool AreEqual(InterpretedObject value, object? other)
    {
        if (UserOverride(value.Type, "Equals", 1) is { } equals)
            return InvokeForLibrary(equals, value, new[] { other }) is bool b ? b : throw new UnknownValueException();
        if (ReferenceEquals(value, other))
            return true;
        if (!value.Type.IsRecord && !value.Type.IsValueType)
            return false;
        if (other is not InterpretedObject that || !SymbolEqualityComparer.Default.Equals(value.Type, that.Type))
            return false;
        foreach (var member in value.Members)
            if (member.Key is not IParameterSymbol && !Equals(Read(member.Value, member.Key), MemberValue(that, member.Key)))
                return false;
        return true;
    }

    public int HashOf(InterpretedObject value)
    {
        if (UserOverride(value.Type, "GetHashCode", 0) is { } hash)
            return InvokeForLibrary(hash, value, Array.Empty<object?>()) is int h ? h : throw new UnknownValueException();
        if (!value.Type.IsRecord && !value.Type.IsValueType)
            return System.Runtime.CompilerServices.RuntimeHelpers.GetHashCode(value);
        var combined = 17;
        foreach (var member in value.Members.Where(m => m.Key is not IParameterSymbol).OrderBy(m => m.Key.Name, StringComparer.Ordinal))
            combined = combined * 31 + (Read(member.Value, member.Key)?.GetHashCode() ?? 0);
        return combined;
    }

    /// <summary>
    /// The design's CompareTo, for library code that orders its objects (Sort, Max, OrderBy): its implementation of
    /// IComparable&lt;T&gt; for the other object's type, else of IComparable. A type that implements neither cannot be
    /// ordered, and the library throws as it does at run time.
    /// </summary>
    public int CompareOf(InterpretedObject value, object? other)
    {
        IMethodSymbol? compareTo = null;
        foreach (var contract in value.Type.AllInterfaces)
        {
            var generic = ClrTypes.MetadataName(contract.OriginalDefinition) == "System.IComparable`1";
            if (!generic && ClrTypes.MetadataName(contract) != "System.IComparable")
                continue;
            if (generic && other is InterpretedObject that && IsOfType(that, contract.TypeArguments[0], null) != true)
                continue;
            if (contract.GetMembers("CompareTo").FirstOrDefault() is IMethodSymbol member
                && value.Type.FindImplementationForInterfaceMember(member) is IMethodSymbol implementation && session.IsInSource(implementation))
            {
                compareTo = implementation;
                if (generic) break;
            }
        }

        if (compareTo is null)
            throw new ArgumentException($"'{value.Type.ToDisplayString()}' does not implement IComparable: its objects cannot be ordered.");
        return InvokeForLibrary(compareTo, value, new[] { other }) is int order ? order : throw new UnknownValueException();
    }

    /// <summary>
    /// Struct values are copied when stored or passed; everything else is shared by reference. Stored where the type is
    /// a reference type (object, an interface) a struct is a box, made by the boxing conversion: then the box is shared.
    /// </summary>
    private object? CopyIfValue(object? value, ITypeSymbol? storedAs, Frame frame)
        => value is InterpretedObject { Type.IsValueType: true } structValue && !IsReferenceType(storedAs, frame) ? structValue.Copy() : value;

    /// <summary>Whether a type is a reference type where the code runs (a type parameter: what it stands for there).</summary>
    private static bool IsReferenceType(ITypeSymbol? type, Frame frame)
        => (type is ITypeParameterSymbol parameter ? frame.TypeArgumentOf(parameter) : type)?.IsReferenceType == true;

    /// <summary>A call of a member the design's type does not declare in source: generated record members, object's members.</summary>
    private object? CallObjectMember(IInvocationOperation invocation, InterpretedObject self, IMethodSymbol method, Frame frame)
    {
        var (arguments, references) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        try
        {
            switch (method.Name)
            {
                case "ToString" when arguments.Length == 0:
                    return TextOf(self);
                case "Equals" when arguments.Length == 1:
                    return AreEqual(self, arguments[0]);
                case "GetHashCode" when arguments.Length == 0 && UserOverride(self.Type, "GetHashCode", 0) is not null:
                    return HashOf(self);
                case "GetHashCode" when arguments.Length == 0 && self.Type.IsRecord:
                    // Library collections may still hash records (where a key goes is not seen): only the number is unknown.
                    return Unsupported(invocation, "the hash code of the record " + Describe(self.Type),
                        "a record's generated GetHashCode hashes its EqualityContract (a Type), whose hash differs from process to process");
                case "GetType" when arguments.Length == 0:
                    return new TypeValue(self.Type);
                case "Deconstruct" when self.Type.IsRecord && method.IsImplicitlyDeclared:
                    var positional = PositionalValues(self);
                    for (var i = 0; i < references.Length && i < positional.Count; i++)
                        if (references[i] is { } variable)
                            variable.Value = positional[i];
                    return null;
            }
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, invocation);
        }

        return Unsupported(invocation, "the call to " + Describe(method), ClrTypes.IsDsl(method)
            ? "the design's inherited Phaseward members are not called at compile time"
            : "it is not declared in this compilation");
    }

    /// <summary>The parts a deconstruction takes from a value that is not a tuple: a KeyValuePair, a record's positional values.</summary>
    private TupleValue? DeconstructedParts(object? value)
    {
        if (value is InterpretedObject { Type.IsRecord: true } record)
            return new TupleValue(PositionalValues(record).ToArray());
        var type = value?.GetType();
        if (type is { IsGenericType: true } && type.GetGenericTypeDefinition() == typeof(KeyValuePair<,>))
            return new TupleValue(new[] { type.GetProperty("Key")!.GetValue(value), type.GetProperty("Value")!.GetValue(value) });
        return null;
    }

    // A stored member of an object, read as the design's code reads it (null when it has none).
    private object? MemberValue(InterpretedObject value, ISymbol member) => value.Find(member) is { } stored ? Read(stored, member) : null;

    /// <summary>The values of a record's positional parameters, in order (what its generated Deconstruct gives).</summary>
    private List<object?> PositionalValues(InterpretedObject record)
    {
        var constructor = record.Type.InstanceConstructors.FirstOrDefault(c => c.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax() is Microsoft.CodeAnalysis.CSharp.Syntax.TypeDeclarationSyntax);
        var values = new List<object?>();
        if (constructor is null) return values;
        foreach (var parameter in constructor.Parameters)
            values.Add(PositionalProperty(record.Type, parameter) is { } property ? MemberValue(record, property) : MemberValue(record, parameter));
        return values;
    }

    /// <summary>
    /// A record's PrintMembers at one level of its hierarchy: the design's own if that level writes one; else the generated
    /// one, which prints the base record's members first, then this level's public fields and properties. True when
    /// something was printed.
    /// </summary>
    private bool PrintMembers(InterpretedObject record, INamedTypeSymbol level, StringBuilder text)
    {
        var own = level.GetMembers("PrintMembers").OfType<IMethodSymbol>()
            .FirstOrDefault(m => !m.IsImplicitlyDeclared && m.Parameters.Length == 1 && m.Parameters[0].Type.Name == nameof(StringBuilder));
        if (own is not null)
            return InvokeForLibrary(own, record, new object?[] { text }) is bool printed ? printed : throw new UnknownValueException();
        var any = level.BaseType is { IsRecord: true } baseRecord && session.IsInSource(baseRecord) && PrintMembers(record, baseRecord, text);
        foreach (var member in level.GetMembers())
        {
            if (member.IsStatic || member.DeclaredAccessibility != Accessibility.Public || member.IsImplicitlyDeclared && member is not IPropertySymbol)
                continue;
            object? value;
            ITypeSymbol type;
            if (member is IFieldSymbol field)
                (value, type) = (MemberValue(record, field), field.Type);
            else if (member is IPropertySymbol { IsIndexer: false, GetMethod: not null } property && property.Name != "EqualityContract")
                (value, type) = (IsAutoProperty(property) ? MemberValue(record, property) : InvokeForLibrary(property.GetMethod!, record, Array.Empty<object?>()), property.Type);
            else
                continue;
            text.Append(any ? ", " : "").Append(member.Name).Append(" = ").Append(ValueText.Of(value, type));
            any = true;
        }

        return any;
    }

    /// <summary>The design's own override of an object member (ToString, Equals, GetHashCode), if it writes one.</summary>
    private IMethodSymbol? UserOverride(INamedTypeSymbol type, string name, int parameters)
    {
        for (var current = type; current is not null && session.IsInSource(current); current = current.BaseType)
            foreach (var member in current.GetMembers(name))
                if (member is IMethodSymbol { IsOverride: true, IsImplicitlyDeclared: false } method && method.Parameters.Length == parameters
                    && (parameters == 0 || method.Parameters[0].Type.SpecialType == SpecialType.System_Object))
                    return method;
        return null;
    }

    /// <summary>The design type's implementation of IFormattable.ToString(string, IFormatProvider), if it has one.</summary>
    private static IMethodSymbol? FormattableToString(InterpretedObject value)
    {
        foreach (var contract in value.Type.AllInterfaces)
            if (contract.ToDisplayString() == "System.IFormattable" && contract.GetMembers("ToString").FirstOrDefault() is IMethodSymbol declared)
                return value.Type.FindImplementationForInterfaceMember(declared) as IMethodSymbol;
        return null;
    }

    /// <summary>Interprets a member for library code (string.Join calling ToString, a HashSet calling Equals).</summary>
    private object? InvokeForLibrary(IMethodSymbol method, InterpretedObject self, object?[] arguments)
    {
        var site = clrSite ?? Current;
        if (site is null)
            throw new UnknownValueException();
        var value = InvokeUser(method, self, arguments, Array.Empty<Variable?>(), site, new Frame(null, null, self));
        return Unknown.Is(value) ? throw new UnknownValueException() : value;
    }
}
