import json
VERSION = "0.1.0-alpha.1"
LOAD = f'#r "nuget: Integrable.Notebooks, {VERSION}"'
def md(text): return {"cell_type": "markdown", "metadata": {}, "source": text.strip("\n").splitlines(keepends=True)}
def code(text): return {"cell_type": "code", "execution_count": None, "metadata": {"dotnet_interactive": {"language": "csharp"}, "polyglot_notebook": {"kernelName": "csharp"}}, "outputs": [], "source": text.strip("\n").splitlines(keepends=True)}
def notebook(name, cells):
    nb = {"cells": cells, "metadata": {"kernelspec": {"display_name": ".NET (C#)", "language": "C#", "name": ".net-csharp"},
          "language_info": {"name": "polyglot-notebook"},
          "polyglot_notebook": {"kernelInfo": {"defaultKernelName": "csharp", "items": [{"aliases": [], "name": "csharp"}]}}},
          "nbformat": 4, "nbformat_minor": 5}
    with open(name, "w") as f: json.dump(nb, f, indent=1, ensure_ascii=False); f.write("\n")

SETUP = code(LOAD + """
using Integrable.Algebra;
using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Plots;
using Integrable.Polynomials;
using Integrable.Recursions;""")

notebook("00-tour.ipynb", [
 md("""
# A tour of Integrable

This tour follows one recursion of our own through the whole library. We call it the *tour rule*:

$$x_{n+1}\\,x_{n-1} = x_n^2 + 3x_n + 1.$$

We ask the questions a researcher asks of a new recursion: what are its terms, are they Laurent
polynomials in the initial values, how fast do their degrees grow, and does it have a conserved
quantity? Loading the package registers the notebook formatters, so objects and reports display
as mathematics and HTML summaries.
"""),
 SETUP,
 code("""
var tour = Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1");
var terms = tour.Iterate(RationalField.Instance, [Rational.One, Rational.One], 8);
string.Join(", ", terms)"""),
 md("From $x_0 = x_1 = 1$ every term is an integer. The Laurent check explains why: every iterate is a Laurent polynomial in $x_0, x_1$ with positive integer coefficients (each division is checked to be exact)."),
 code("""LaurentPhenomenon.Check(tour, 6)"""),
 md("The degrees of the iterates (as rational functions of the initial values) grow linearly: the rule is linearisable."),
 code("""DegreeGrowth.Analyse(tour, 15)"""),
 md("""
Linear growth suggests a conserved quantity. For this rule
$K = (x_{n-1}^2 + x_n^2 + 3x_{n-1} + 3x_n + 1)/(x_{n-1}x_n)$ stays constant (a short computation:
$x_{n+1}$ and $x_{n-1}$ are the two roots of a quadratic whose product is $x_n^2 + 3x_n + 1$).
We evaluate it exactly along the orbit:
"""),
 code("""
var ring = new LaurentPolynomialRing("x", "y");
var k = LaurentPolynomial.Parse(ring, "x/y + y/x + 3/x + 3/y + 1/(x*y)");
Enumerable.Range(0, terms.Count - 1).Select(i => k.Evaluate([terms[i], terms[i + 1]]).ToString()).Distinct()"""),
 md("So $x_{n+1} = 9x_n - x_{n-1} - 3$ on this orbit. The other notebooks go through each capability: [iterate](01-iterate.ipynb), [Laurent](02-laurent.ipynb), [growth](03-growth.ipynb), [clusters](04-clusters.ipynb), [plots](05-plots.ipynb)."),
])

notebook("01-iterate.ipynb", [
 md("""
# Iterating a recursion exactly

A recursion is parsed from its equation; it is then iterated in any ring: rationals, a prime field,
doubles or Laurent polynomials in the initial values.
"""),
 SETUP,
 code("""
var tour = Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1");
Console.WriteLine($"order {tour.Order}, parameters: [{string.Join(", ", tour.Parameters)}]");
string.Join(", ", tour.Iterate(RationalField.Instance, [Rational.One, new Rational(2)], 6))"""),
 md("The same rule symbolically, over Laurent polynomials in the initial values $a, b$:"),
 code("""
var ring = new LaurentPolynomialRing("a", "b");
var symbolic = tour.Iterate<LaurentPolynomial>(ring, [ring.Variable(0), ring.Variable(1)], 2);
symbolic[3]"""),
 md("A recursion with a parameter: values are given in the order of `Parameters`."),
 code("""
var weighted = Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + c*x_n + 1");
string.Join(", ", weighted.Iterate(RationalField.Instance, [Rational.One, Rational.One], 6, [new Rational(5)]))"""),
])

notebook("02-laurent.ipynb", [
 md("""
# The Laurent property

`LaurentPhenomenon.Check` computes every iterate exactly as a Laurent polynomial in the initial
values, checking each division; the first iterate that is not Laurent comes with a witness.
"""),
 SETUP,
 code("""LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 6)"""),
 md("Raising the power of $x_n$ from $2$ to $3$ breaks the property; the report names the first failure and the divisor that does not divide:"),
 code("""
var broken = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^3 + 3*x_n + 1"), 6);
broken"""),
 code("""broken.Steps[^1].Value"""),
])

notebook("03-growth.ipynb", [
 md("""
# Degree growth and algebraic entropy

The degrees of the iterates, measured on random lines modulo primes, are fitted by a rational
generating function; its dominant root gives the growth class. Polynomial growth is the hallmark of
integrability, exponential growth (positive entropy) of chaos.
"""),
 SETUP,
 code("""DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 15)"""),
 md("Our plane map from the plots notebook grows quadratically:"),
 code("""DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = (3*x_n - 1)/(x_n^2 + 1)"), 15)"""),
 md("Raising the power of $x_n$ in the tour rule to $3$ makes the growth exponential (entropy $\\log 3$):"),
 code("""
var wild = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^3 + 3*x_n + 1"), 10);
Console.WriteLine(wild.Fit);
GrowthPlot.Render(wild)"""),
])

notebook("04-clusters.ipynb", [
 md("""
# Seeds, quivers and mutation

A quiver of our own: three mutable vertices in an oriented triangle with a double arrow, and a
frozen vertex pointing at vertex 1. It displays as a graph with its exchange matrix.
"""),
 SETUP,
 code("""
var quiver = new Quiver(3, 1, [new Arrow(1, 2, 2), new Arrow(2, 3), new Arrow(3, 1), new Arrow(4, 1)]);
quiver"""),
 code("""quiver.Mutate(2)"""),
 md("The initial seed over Laurent polynomials and one mutation; cluster variables display as LaTeX:"),
 code("""
var seed = LaurentSeeds.Initial(quiver.ToMatrix());
seed.Mutate(1)"""),
 md("Every cluster variable along a mutation sequence is a Laurent polynomial (the Laurent phenomenon); the check is exact:"),
 code("""LaurentPhenomenon.Check(quiver.ToMatrix(), [1, 2, 3, 1, 2])"""),
 md("A finite-type exchange graph, explored completely:"),
 code("""ExchangeGraph.Explore(ExchangeMatrix.FiniteType('A', 3))"""),
])

notebook("05-plots.ipynb", [
 md("""
# Plots

All plots are SVG written by the library itself (no native dependency). Our plane map

$$x_{n+1} + x_{n-1} = \\frac{3x_n - 1}{x_n^2 + 1}$$

keeps $I(x, y) = x^2y^2 + x^2 + y^2 - 3xy + x + y$ constant ($x_{n-1}$ and $x_{n+1}$ are the two
roots of $I(t, x_n) = K$ in $t$). Its orbits lie on the level curves of $I$, drawn by marching
squares.
"""),
 SETUP,
 code("""
var map = Recurrence.Parse("x_{n+1} + x_{n-1} = (3*x_n - 1)/(x_n^2 + 1)");
var invariant = LaurentPolynomial.Parse(new LaurentPolynomialRing("x", "y"), "x^2*y^2 + x^2 + y^2 - 3*x*y + x + y");
var orbits = OrbitPlot.Render(map, [(0.5, 0.25), (1.0, -0.5), (0.3, 1.2)], new OrbitPlotOptions { Points = 2000, Invariant = invariant });
orbits"""),
 code("""GrowthPlot.Render(DegreeGrowth.Analyse(map, 15))"""),
 code("""LaurentPlot.Render(LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 7))"""),
 code("""QuiverPlot.Render(new Quiver(3, 1, [new Arrow(1, 2, 2), new Arrow(2, 3), new Arrow(3, 1), new Arrow(4, 1)]), "our quiver")"""),
 md("Any plot can be saved: `orbits.Save(\"orbits.svg\")`."),
])
