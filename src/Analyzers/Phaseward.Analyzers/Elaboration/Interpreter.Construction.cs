using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Building the design object the way C# does: field and property initializers of a class run before its base
// constructor, then the constructor body; ': this(...)' skips the initializers of the delegating constructor.
internal sealed partial class Interpreter
{
    public InterpretedObject NewObject(INamedTypeSymbol type)
    {
        var instance = new InterpretedObject(type, this);
        for (var current = type; current is not null && session.IsInSource(current); current = current.BaseType)
            foreach (var member in current.GetMembers())
            {
                if (member is IFieldSymbol { IsStatic: false, IsConst: false } field && !field.IsImplicitlyDeclared)
                    instance.GetOrAdd(field).Value = DefaultOf(field.Type);
                else if (member is IPropertySymbol { IsStatic: false } property && IsAutoProperty(property))
                    instance.GetOrAdd(property).Value = DefaultOf(property.Type);
            }

        return instance;
    }

    /// <summary><c>new T(...)</c> of a class, struct or record declared in the design's source.</summary>
    private object? CreateObject(IObjectCreationOperation creation, INamedTypeSymbol type, IMethodSymbol constructor, Frame frame)
    {
        Step(creation);
        // Built even when an argument is unknown: the fields that depend on it stay unknown, the others are known.
        var (arguments, _) = Arguments(creation.Arguments, constructor, frame, keepUnknown: true);
        return Initialize(creation, MakeObject(creation, type, constructor, arguments!), frame);
    }

    // A new object of the design's type, its constructor run with the creation as the caller of what it reports.
    private InterpretedObject MakeObject(IOperation creation, INamedTypeSymbol type, IMethodSymbol constructor, object?[] arguments)
    {
        // Made even when its type failed to initialize outside a try: that is PW9003 here, and elaboration goes on.
        InitializeForUse(type, creation.Syntax);
        var made = NewObject(type);
        EnterCall(creation);
        var outerCallers = callers;
        PushCaller(creation.Syntax);
        try
        {
            Construct(made, constructor, arguments, creation);
        }
        finally
        {
            callers = outerCallers;
            LeaveCall();
        }

        return made;
    }

    public void Construct(InterpretedObject instance, IMethodSymbol constructor, object?[] arguments, IOperation? site)
    {
        var type = constructor.ContainingType;
        if (!session.IsInSource(type))
            return; // Phaseward.Design's constructor sets nothing the elaborator needs.

        cancellationToken.ThrowIfCancellationRequested();
        var syntax = constructor.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken);
        // A base class's static constructor runs when its constructor is first reached (after the derived class's
        // field initializers), as in C#.
        if ((site?.Syntax ?? syntax) is { } reached)
            InitializeForUse(type, reached);
        switch (syntax)
        {
            case ConstructorDeclarationSyntax declaration when ModelOf(declaration).GetOperation(declaration, cancellationToken) is IConstructorBodyOperation body:
                // The body names the parameters of the constructor as declared (GBox<T>'s, not GBox<string>'s).
                var frame = new Frame(constructor.OriginalDefinition, null, instance);
                var parameters = constructor.OriginalDefinition.Parameters;
                for (var i = 0; i < parameters.Length && i < arguments.Length; i++)
                    frame.Declare(parameters[i], arguments[i]);
                var chained = body.Initializer switch
                {
                    IExpressionStatementOperation { Operation: IInvocationOperation invocation } => invocation,
                    IInvocationOperation invocation => invocation,
                    _ => null,
                };
                if (chained is null || !SymbolEqualityComparer.Default.Equals(chained.TargetMethod.ContainingType, type))
                    RunInitializers(instance, type);
                if (chained is not null)
                {
                    var (values, _) = Arguments(chained.Arguments, chained.TargetMethod, frame);
                    // ': this(...)' chains can loop in code that does not compile yet (a constructor calling itself):
                    // each link counts against the recursion limit, so the elaborator stops instead of overflowing the stack.
                    EnterCall(chained);
                    try
                    {
                        Construct(instance, chained.TargetMethod, values ?? UnknownArguments(chained.TargetMethod), chained);
                    }
                    finally
                    {
                        LeaveCall();
                    }
                }
                else
                {
                    ConstructBase(instance, type);
                }

                var statements = (IOperation?)body.BlockBody ?? body.ExpressionBody;
                if (statements is not null)
                    Execute(statements, frame);
                return;

            case TypeDeclarationSyntax:
                // A primary constructor: its parameters are readable throughout the class; a record's positional
                // parameters are also its properties.
                for (var i = 0; i < constructor.Parameters.Length && i < arguments.Length; i++)
                {
                    instance.GetOrAdd(constructor.Parameters[i]).Value = arguments[i];
                    if (type.IsRecord && PositionalProperty(type, constructor.Parameters[i]) is { } positional)
                        instance.GetOrAdd(positional).Value = arguments[i];
                }

                RunInitializers(instance, type);
                ConstructBase(instance, type);
                return;

            default:
                // The implicit parameterless constructor.
                RunInitializers(instance, type);
                ConstructBase(instance, type);
                return;
        }
    }

    // An argument that is not known stays unknown in the constructor it is passed to: never read as null or zero.
    private static object?[] UnknownArguments(IMethodSymbol constructor)
        => Enumerable.Repeat<object?>(Unknown.Value, constructor.Parameters.Length).ToArray();

    private void ConstructBase(InterpretedObject instance, INamedTypeSymbol type)
    {
        if (type.BaseType is not { } baseType || !session.IsInSource(baseType))
            return;
        var primaryBase = type.DeclaringSyntaxReferences.Select(r => r.GetSyntax(cancellationToken)).OfType<TypeDeclarationSyntax>()
            .SelectMany(t => t.BaseList?.Types ?? default).OfType<PrimaryConstructorBaseTypeSyntax>().FirstOrDefault();
        if (primaryBase is not null && ModelOf(primaryBase).GetOperation(primaryBase, cancellationToken) is IInvocationOperation call)
        {
            var frame = new Frame(null, null, instance);
            var (values, _) = Arguments(call.Arguments, call.TargetMethod, frame);
            Construct(instance, call.TargetMethod, values ?? UnknownArguments(call.TargetMethod), call);
            return;
        }

        var parameterless = baseType.InstanceConstructors.FirstOrDefault(c => c.Parameters.All(p => p.IsOptional));
        if (parameterless is not null)
            Construct(instance, parameterless, parameterless.Parameters.Select(p => p.HasExplicitDefaultValue ? p.ExplicitDefaultValue : null).ToArray(), null);
    }

    private void RunInitializers(InterpretedObject instance, INamedTypeSymbol type)
    {
        var frame = new Frame(null, null, instance);
        foreach (var member in type.GetMembers())
        {
            if (member.IsStatic || member is not (IFieldSymbol or IPropertySymbol))
                continue;
            if (InitializerOf(member is IFieldSymbol { AssociatedSymbol: IPropertySymbol auto } ? auto : member) is { } initializer)
                instance.GetOrAdd(member is IFieldSymbol { AssociatedSymbol: IPropertySymbol p } ? p : member).Value = Evaluate(initializer, frame);
        }
    }

    /// <summary>The design's Name: the class name, unless the design overrides Name (then its getter is interpreted).</summary>
    public string ComputeName(InterpretedObject instance, IOperation site)
    {
        var name = instance.Type.MetadataName;
        var overriding = instance.Type.GetMembers("Name").OfType<IPropertySymbol>().FirstOrDefault();
        for (var current = instance.Type; overriding is null && current?.BaseType is { } next && session.IsInSource(next); current = next)
            overriding = next.GetMembers("Name").OfType<IPropertySymbol>().FirstOrDefault(p => p.IsOverride);
        if (overriding is null || !overriding.IsOverride || overriding.GetMethod is null)
            return name;
        var value = IsAutoProperty(overriding)
            ? instance.GetOrAdd(overriding).Value
            : InvokeUser(overriding.GetMethod, instance, System.Array.Empty<object?>(), System.Array.Empty<Variable?>(), site, new Frame(null, null, instance));
        if (value is string text)
            return text;
        if (!Unknown.Is(value))
            Unsupported(site, "the design's Name", "its getter did not give a string");
        return name;
    }
}
