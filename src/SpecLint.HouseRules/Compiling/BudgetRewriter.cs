using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace SpecLint.HouseRules.Compiling;

/// <summary>
/// Instruments a house rule so that it can be stopped: a call to the budget's <c>Tick</c> at the entry of every
/// method, accessor, local function and lambda, at the top of every loop body, labelled statement and switch
/// section. Nothing is put on a new line, so line numbers in stack traces stay those of the author's file.
/// Expression bodies become block bodies; the semantic model of the uninstrumented compilation says whether a
/// lambda returns a value.
/// </summary>
internal sealed class BudgetRewriter(SemanticModel model) : CSharpSyntaxRewriter
{
    private static StatementSyntax Tick() =>
        SyntaxFactory.ParseStatement(BudgetRuntime.TickCall).WithTrailingTrivia(SyntaxFactory.Space);

    public override SyntaxNode? VisitBlock(BlockSyntax node)
    {
        var visited = (BlockSyntax)base.VisitBlock(node)!;
        return IsBodyStart(node) ? Prepend(visited) : visited;
    }

    public override SyntaxNode? VisitSwitchSection(SwitchSectionSyntax node)
    {
        var visited = (SwitchSectionSyntax)base.VisitSwitchSection(node)!;
        if (visited.Statements.Count == 0)
        {
            return visited;
        }

        var first = visited.Statements[0];
        var statements = visited.Statements.Replace(first, first.WithLeadingTrivia(SyntaxFactory.Space)).Insert(0, Tick().WithLeadingTrivia(first.GetLeadingTrivia()));
        return visited.WithStatements(statements);
    }

    public override SyntaxNode? VisitForStatement(ForStatementSyntax node)
    {
        var v = (ForStatementSyntax)base.VisitForStatement(node)!;
        return v.WithStatement(LoopBody(v.Statement));
    }

    public override SyntaxNode? VisitForEachStatement(ForEachStatementSyntax node)
    {
        var v = (ForEachStatementSyntax)base.VisitForEachStatement(node)!;
        return v.WithStatement(LoopBody(v.Statement));
    }

    public override SyntaxNode? VisitForEachVariableStatement(ForEachVariableStatementSyntax node)
    {
        var v = (ForEachVariableStatementSyntax)base.VisitForEachVariableStatement(node)!;
        return v.WithStatement(LoopBody(v.Statement));
    }

    public override SyntaxNode? VisitWhileStatement(WhileStatementSyntax node)
    {
        var v = (WhileStatementSyntax)base.VisitWhileStatement(node)!;
        return v.WithStatement(LoopBody(v.Statement));
    }

    public override SyntaxNode? VisitDoStatement(DoStatementSyntax node)
    {
        var v = (DoStatementSyntax)base.VisitDoStatement(node)!;
        return v.WithStatement(LoopBody(v.Statement));
    }

    public override SyntaxNode? VisitLabeledStatement(LabeledStatementSyntax node)
    {
        var v = (LabeledStatementSyntax)base.VisitLabeledStatement(node)!;
        return v.WithStatement(Wrap(v.Statement));
    }

    public override SyntaxNode? VisitMethodDeclaration(MethodDeclarationSyntax node)
    {
        var returnsVoid = node.ReturnType is PredefinedTypeSyntax p && p.Keyword.IsKind(SyntaxKind.VoidKeyword);
        var v = (MethodDeclarationSyntax)base.VisitMethodDeclaration(node)!;
        return v.ExpressionBody is { } e && !IsRef(e.Expression)
            ? v.WithExpressionBody(null).WithSemicolonToken(default).WithBody(BlockFor(e, returnsVoid, v.SemicolonToken))
            : v;
    }

    public override SyntaxNode? VisitLocalFunctionStatement(LocalFunctionStatementSyntax node)
    {
        var returnsVoid = node.ReturnType is PredefinedTypeSyntax p && p.Keyword.IsKind(SyntaxKind.VoidKeyword);
        var v = (LocalFunctionStatementSyntax)base.VisitLocalFunctionStatement(node)!;
        return v.ExpressionBody is { } e && !IsRef(e.Expression)
            ? v.WithExpressionBody(null).WithSemicolonToken(default).WithBody(BlockFor(e, returnsVoid, v.SemicolonToken))
            : v;
    }

    public override SyntaxNode? VisitConstructorDeclaration(ConstructorDeclarationSyntax node)
    {
        var v = (ConstructorDeclarationSyntax)base.VisitConstructorDeclaration(node)!;
        return v.ExpressionBody is { } e ? v.WithExpressionBody(null).WithSemicolonToken(default).WithBody(BlockFor(e, true, v.SemicolonToken)) : v;
    }

    public override SyntaxNode? VisitOperatorDeclaration(OperatorDeclarationSyntax node)
    {
        var v = (OperatorDeclarationSyntax)base.VisitOperatorDeclaration(node)!;
        return v.ExpressionBody is { } e ? v.WithExpressionBody(null).WithSemicolonToken(default).WithBody(BlockFor(e, false, v.SemicolonToken)) : v;
    }

    public override SyntaxNode? VisitConversionOperatorDeclaration(ConversionOperatorDeclarationSyntax node)
    {
        var v = (ConversionOperatorDeclarationSyntax)base.VisitConversionOperatorDeclaration(node)!;
        return v.ExpressionBody is { } e ? v.WithExpressionBody(null).WithSemicolonToken(default).WithBody(BlockFor(e, false, v.SemicolonToken)) : v;
    }

    public override SyntaxNode? VisitAccessorDeclaration(AccessorDeclarationSyntax node)
    {
        var returnsVoid = !node.IsKind(SyntaxKind.GetAccessorDeclaration);
        var v = (AccessorDeclarationSyntax)base.VisitAccessorDeclaration(node)!;
        return v.ExpressionBody is { } e && !IsRef(e.Expression)
            ? v.WithExpressionBody(null).WithSemicolonToken(default).WithBody(BlockFor(e, returnsVoid, v.SemicolonToken))
            : v;
    }

    public override SyntaxNode? VisitPropertyDeclaration(PropertyDeclarationSyntax node)
    {
        var v = (PropertyDeclarationSyntax)base.VisitPropertyDeclaration(node)!;
        if (v.ExpressionBody is not { } e || IsRef(e.Expression))
        {
            return v;
        }

        return v.WithExpressionBody(null).WithSemicolonToken(default).WithAccessorList(Getter(e, v.SemicolonToken));
    }

    public override SyntaxNode? VisitIndexerDeclaration(IndexerDeclarationSyntax node)
    {
        var v = (IndexerDeclarationSyntax)base.VisitIndexerDeclaration(node)!;
        if (v.ExpressionBody is not { } e || IsRef(e.Expression))
        {
            return v;
        }

        return v.WithExpressionBody(null).WithSemicolonToken(default).WithAccessorList(Getter(e, v.SemicolonToken));
    }

    public override SyntaxNode? VisitSimpleLambdaExpression(SimpleLambdaExpressionSyntax node)
    {
        var returnsVoid = ReturnsVoid(node);
        var v = (SimpleLambdaExpressionSyntax)base.VisitSimpleLambdaExpression(node)!;
        return v.ExpressionBody is { } e && returnsVoid is { } rv && !IsRef(e) ? v.WithExpressionBody(null).WithBlock(LambdaBlock(e, rv)) : v;
    }

    public override SyntaxNode? VisitParenthesizedLambdaExpression(ParenthesizedLambdaExpressionSyntax node)
    {
        var returnsVoid = ReturnsVoid(node);
        var v = (ParenthesizedLambdaExpressionSyntax)base.VisitParenthesizedLambdaExpression(node)!;
        return v.ExpressionBody is { } e && returnsVoid is { } rv && !IsRef(e) ? v.WithExpressionBody(null).WithBlock(LambdaBlock(e, rv)) : v;
    }

    private bool? ReturnsVoid(LambdaExpressionSyntax lambda) =>
        model.GetSymbolInfo(lambda).Symbol is IMethodSymbol m ? m.ReturnsVoid : null;

    private static bool IsRef(ExpressionSyntax e) => e is RefExpressionSyntax;

    // Blocks that are a body of something that can be called: put the tick first.
    private static bool IsBodyStart(BlockSyntax node) => node.Parent is BaseMethodDeclarationSyntax or AccessorDeclarationSyntax
        or LocalFunctionStatementSyntax or AnonymousFunctionExpressionSyntax;

    private static BlockSyntax Prepend(BlockSyntax block) =>
        block.WithStatements(block.Statements.Insert(0, Tick()));

    private static StatementSyntax LoopBody(StatementSyntax body) => body is BlockSyntax b ? Prepend(b) : Wrap(body);

    // `stmt` becomes `{ Tick(); stmt }` with the statement's leading trivia moved before the brace.
    private static BlockSyntax Wrap(StatementSyntax statement)
    {
        var open = SyntaxFactory.Token(statement.GetLeadingTrivia(), SyntaxKind.OpenBraceToken, SyntaxFactory.TriviaList(SyntaxFactory.Space));
        var close = SyntaxFactory.Token(SyntaxFactory.TriviaList(SyntaxFactory.Space), SyntaxKind.CloseBraceToken, statement.GetTrailingTrivia());
        return SyntaxFactory.Block(open, SyntaxFactory.List([Tick(), statement.WithLeadingTrivia().WithTrailingTrivia()]), close);
    }

    // `=> expr;` becomes `{ Tick(); return expr; }` (or `{ Tick(); expr; }`) on the same line; the expression
    // keeps its leading trivia, so a body that starts on the next line stays there.
    private static BlockSyntax BlockFor(ArrowExpressionClauseSyntax arrow, bool returnsVoid, SyntaxToken semicolon) =>
        Body(arrow.GetLeadingTrivia(), arrow.Expression.WithoutTrailingTrivia(), returnsVoid,
            semicolon == default ? arrow.GetTrailingTrivia() : semicolon.TrailingTrivia);

    // A lambda's expression body `x => expr` becomes `x => { Tick(); return expr; }`.
    private static BlockSyntax LambdaBlock(ExpressionSyntax expr, bool returnsVoid) =>
        Body(expr.GetLeadingTrivia(), expr.WithoutTrivia(), returnsVoid, expr.GetTrailingTrivia());

    private static BlockSyntax Body(SyntaxTriviaList leading, ExpressionSyntax expr, bool returnsVoid, SyntaxTriviaList trailing)
    {
        StatementSyntax body = returnsVoid
            ? SyntaxFactory.ExpressionStatement(expr)
            : SyntaxFactory.ReturnStatement(SyntaxFactory.Token(SyntaxKind.ReturnKeyword).WithTrailingTrivia(SyntaxFactory.Space), expr, SyntaxFactory.Token(SyntaxKind.SemicolonToken));
        var open = SyntaxFactory.Token(leading, SyntaxKind.OpenBraceToken, SyntaxFactory.TriviaList(SyntaxFactory.Space));
        var close = SyntaxFactory.Token(SyntaxFactory.TriviaList(SyntaxFactory.Space), SyntaxKind.CloseBraceToken, trailing);
        return SyntaxFactory.Block(open, SyntaxFactory.List([Tick(), body.WithTrailingTrivia(SyntaxFactory.Space)]), close);
    }

    // An expression-bodied property or indexer `=> expr;` becomes `{ get { Tick(); return expr; } }`.
    private static AccessorListSyntax Getter(ArrowExpressionClauseSyntax arrow, SyntaxToken semicolon) =>
        SyntaxFactory.AccessorList(SyntaxFactory.SingletonList(
                SyntaxFactory.AccessorDeclaration(SyntaxKind.GetAccessorDeclaration).WithBody(BlockFor(arrow, false, default))))
            .WithTrailingTrivia(semicolon.TrailingTrivia);
}
