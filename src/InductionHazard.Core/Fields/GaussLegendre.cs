using System.Collections.Concurrent;
using MathNet.Numerics.Integration;

namespace InductionHazard.Fields;

/// <summary>
/// Gauss-Legendre nodes and weights on [-1, 1] (MathNet.Numerics), computed once per order and shared, so
/// that no quadrature loop copies them (the library's getters return a fresh array on every read).
/// </summary>
internal static class GaussLegendre
{
    private static readonly ConcurrentDictionary<int, Rule> Rules = new();

    /// <summary>The rule of an order.</summary>
    public static Rule Of(int order) => Rules.GetOrAdd(order, n =>
    {
        var rule = new GaussLegendreRule(-1, 1, n);
        return new Rule(rule.Abscissas, rule.Weights);
    });

    /// <summary>Nodes and weights on [-1, 1].</summary>
    internal sealed class Rule
    {
        public Rule(double[] nodes, double[] weights)
        {
            Nodes = nodes;
            Weights = weights;
        }

        public double[] Nodes { get; }

        public double[] Weights { get; }
    }
}
