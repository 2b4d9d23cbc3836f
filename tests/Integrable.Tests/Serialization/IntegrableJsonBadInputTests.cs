using System.Text.Json;
using Integrable.Clusters;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Serialization;
using Integrable.Text;

namespace Integrable.Tests.Serialization;

/// <summary>Bad JSON gives a <see cref="JsonException"/> that names the type and the field.</summary>
public class IntegrableJsonBadInputTests
{
    private static JsonException Bad<T>(string json, params string[] mentions)
    {
        var e = Assert.Throws<JsonException>(() => IntegrableJson.Deserialize<T>(json));
        foreach (var m in mentions) Assert.Contains(m, e.Message, StringComparison.Ordinal);
        return e;
    }

    [Fact]
    public void Recurrence_MalformedEquation_NamesFieldWithParseErrorInside()
    {
        var e = Bad<Recurrence>("""{"equation": "x_{n+1} x_{n-1} = x_n^2 +* 1", "index": "n"}""", "Recurrence", "'equation'");
        Assert.IsType<ExpressionParseException>(e.InnerException);
        var f = Bad<Recurrence>("""{"equation": "x_n = x_n + 1"}""", "Recurrence", "'equation'");
        Assert.IsType<EquationException>(f.InnerException);
    }

    [Fact]
    public void Recurrence_MissingUnknownOrIllTypedField_NamesIt()
    {
        Bad<Recurrence>("""{"index": "n"}""", "required field 'equation' is missing");
        Bad<Recurrence>("""{"equation": "x_{n+1} = x_n + 1", "order": 1}""", "unknown field 'order'");
        Bad<Recurrence>("""{"equation": 3}""", "'equation' must be a string, got a number");
        Bad<Recurrence>("""["x_{n+1} = x_n"]""", "Recurrence: expected a JSON object, got an array");
        Bad<Recurrence>("""{"equation": "x_{n+1} = x_n", "equation": "x_{n+1} = 2 x_n"}""", "'equation' appears twice");
    }

    [Fact]
    public void Deserialize_NullOrSyntaxError_TypedException()
    {
        Bad<Recurrence>("null", "the JSON is null");
        Assert.Throws<JsonException>(() => IntegrableJson.Deserialize<Recurrence>("""{"equation": "x_{n+1} = x_n" """));
        Assert.Throws<ArgumentNullException>(() => IntegrableJson.Deserialize<Recurrence>(null!));
    }

    [Fact]
    public void Rational_NotAFraction_NamesValue()
    {
        Bad<Rational>("\"1/0\"", "Rational", "\"p/q\"");
        Bad<Rational>("\"two\"", "got \"two\"");
        Bad<Rational>("0.5", "got 0.5");
        Bad<Rational>("null", "got null");
    }

    [Fact]
    public void RationalMatrix_WrongShapeOrEntry_NamesPlace()
    {
        Bad<RationalMatrix>("""{"rowCount": 2, "columnCount": 2, "entries": [["1", "2"]]}""", "'entries' has 1 rows, rowCount says 2");
        Bad<RationalMatrix>("""{"rowCount": 1, "columnCount": 2, "entries": [["1"]]}""", "'entries[0]' has 1 entries");
        Bad<RationalMatrix>("""{"rowCount": 1, "columnCount": 2, "entries": [["1", "x"]]}""", "'entries[0][1]'");
    }

    [Fact]
    public void LaurentPolynomial_UnknownVariableOrInexactDivision_NamesText()
    {
        var e = Bad<LaurentPolynomial>("""{"ring": ["x", "y"], "text": "x + z"}""", "LaurentPolynomial", "'text'");
        Assert.IsType<ExpressionEvaluationException>(e.InnerException);
        Bad<LaurentPolynomial>("""{"ring": ["x"], "text": "1/(x + 1)"}""", "'text'");
        Bad<LaurentPolynomial>("""{"ring": ["x", "x"], "text": "x"}""", "'ring'");
    }

    [Fact]
    public void RationalFunction_DivisionByZero_NamesText()
    {
        var e = Bad<RationalFunction>("""{"field": ["x"], "text": "x/(x - x)"}""", "RationalFunction", "'text'");
        Assert.IsType<ExpressionEvaluationException>(e.InnerException);
    }

    [Fact]
    public void ExchangeMatrix_NotSkewSymmetrizableOrRagged_NamesRows()
    {
        var e = Bad<ExchangeMatrix>("""{"mutableCount": 2, "rows": [[0, 1], [1, 0]]}""", "ExchangeMatrix", "'rows'");
        Assert.IsType<NotSkewSymmetrizableException>(e.InnerException);
        Bad<ExchangeMatrix>("""{"mutableCount": 2, "rows": [[0, 1], [-1]]}""", "'rows[1]' has 1 entries");
        Bad<ExchangeMatrix>("""{"mutableCount": 3, "rows": [[0, 1], [-1, 0]]}""", "fewer than mutableCount");
        Bad<ExchangeMatrix>("""{"mutableCount": 2, "rows": [[0, 1.5], [-1, 0]]}""", "'rows[0][1]' must be a 32-bit integer, got 1.5");
        Bad<ExchangeMatrix>("""{"mutableCount": 0, "rows": []}""", "'mutableCount' must be at least 1");
    }

    [Fact]
    public void Quiver_LoopOrBadVertex_NamesArrows()
    {
        var e = Bad<Quiver>("""{"mutableCount": 2, "frozenCount": 0, "arrows": [{"from": 1, "to": 1}]}""", "Quiver", "'arrows'", "loop");
        Assert.IsType<ArgumentException>(e.InnerException);
        Bad<Quiver>("""{"mutableCount": 2, "frozenCount": 0, "arrows": [{"from": 1}]}""", "arrows[0]", "'to' is missing");
    }

    [Fact]
    public void Seed_WrongCountOrForeignVariable_NamesField()
    {
        const string matrix = """{"mutableCount": 2, "rows": [[0, 1], [-1, 0]]}""";
        Bad<Seed<LaurentPolynomial>>($$"""{"ring": ["x_1", "x_2"], "matrix": {{matrix}}, "variables": ["x_1"]}""", "Seed", "'variables'", "needs 2 variables, got 1");
        Bad<Seed<LaurentPolynomial>>($$"""{"ring": ["x_1", "x_2"], "matrix": {{matrix}}, "variables": ["x_1", "x_3"]}""", "'variables[1]'");
        Bad<Seed<LaurentPolynomial>>("""{"ring": ["x_1", "x_2"], "matrix": {"mutableCount": 2, "rows": [[0, 1], [1, 0]]}, "variables": ["x_1", "x_2"]}""",
            "Seed matrix", "'rows'");
        Bad<Seed<Rational>>($$"""{"matrix": {{matrix}}, "variables": ["1", "1/0"]}""", "'variables[1]'");
    }

    [Fact]
    public void RationalMap_UnknownNameOrCountMismatch_NamesField()
    {
        Bad<RationalMap>("""{"stateVariables": ["x", "y"], "parameters": [], "components": ["y", "(y + b)/x"]}""", "RationalMap", "'components[1]'");
        Bad<RationalMap>("""{"stateVariables": ["x", "y"], "parameters": [], "components": ["y"]}""", "'components'", "2 components, got 1");
        Bad<RationalMap>("""{"stateVariables": ["x", "x"], "components": ["x", "x"]}""", "RationalMap");
    }

    [Fact]
    public void RecurrenceSystemAndLattice_BadEquations_NameField()
    {
        Bad<RecurrenceSystem>("""{"equations": "x_{n+1} = y_n; y_{n+1} = (", "index": "n"}""", "RecurrenceSystem", "'equations'");
        Bad<LatticeRecurrence>("""{"equation": "T_{a,n+1} = "}""", "LatticeRecurrence", "'equation'");
    }
}
