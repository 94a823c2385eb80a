using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace LunarShadow.Astronomy.Ephemeris;

/// <summary>
/// A Poisson series Σₖ tᵏ Σᵢ Aₖᵢ·sin(φₖᵢ(t)) whose phases are polynomials φ = p₀ + p₁t + p₂t² + p₃t³ + p₄t⁴,
/// the shape both ELP/MPP02 and VSOP87 take. Stored column-wise and summed eight or four terms at a time (the widest
/// vectors the hardware runs), giving the value and its time derivative in one pass.
/// </summary>
internal sealed class PolynomialPhaseSeries
{
    private readonly PowerGroup[] _groups;

    /// <summary>Number of terms over all powers of t.</summary>
    public int TermCount { get; }

    private PolynomialPhaseSeries(PowerGroup[] groups)
    {
        _groups = groups;
        TermCount = groups.Sum(g => g.Count);
    }

    /// <summary>
    /// Builds a series from rows of [amplitude, p₀, p₁, (p₂, p₃, p₄)] per power of t (index = power).
    /// </summary>
    public static PolynomialPhaseSeries FromSineRows(IReadOnlyList<double[][]> rowsByPower) =>
        new(rowsByPower.Select((rows, power) => new PowerGroup(power, rows, 0.0)).ToArray());

    /// <summary>
    /// Builds a series from VSOP87 rows of [A, B, C] meaning A·cos(B + C·t), per power of t.
    /// </summary>
    public static PolynomialPhaseSeries FromCosineRows(IReadOnlyList<double[][]> rowsByPower) =>
        new(rowsByPower.Select((rows, power) => new PowerGroup(power, rows, Math.PI / 2)).ToArray());

    /// <summary>How a table's rows read.</summary>
    public enum TermShape
    {
        /// <summary>[A, p₀, p₁, p₂, p₃, p₄]: A·sin(φ(t)) (ELP/MPP02).</summary>
        Sine,

        /// <summary>[A, B, C]: A·cos(B + C·t) (VSOP87).</summary>
        Cosine,
    }

    /// <summary>
    /// The series of one coordinate from blocks named coordinate + power ("L0", "L1", …), optionally keeping only the terms
    /// whose largest contribution over |t| ≤ <paramref name="timeSpan"/> reaches <paramref name="minimumContribution"/>.
    /// </summary>
    public static PolynomialPhaseSeries FromBlocks(
        Embedded.BlockFile file, string coordinate, TermShape shape, double minimumContribution = 0, double timeSpan = 1)
    {
        var powers = new List<double[][]>();
        for (var k = 0; file.Contains($"{coordinate}{k}"); k++)
        {
            var scale = Math.Pow(timeSpan, k);
            powers.Add(file[$"{coordinate}{k}"].Where(row => Math.Abs(row[0]) * scale >= minimumContribution).ToArray());
        }
        return shape == TermShape.Sine ? FromSineRows(powers) : FromCosineRows(powers);
    }

    /// <summary>How the terms are summed: the widest the hardware runs natively, or one width (for tests).</summary>
    internal enum SumWidth
    {
        /// <summary>512-bit vectors where the hardware has them, else 256-bit, else one term at a time.</summary>
        Widest,

        /// <summary>Eight terms at a time (needs Vector512 hardware).</summary>
        Vector512,

        /// <summary>Four terms at a time (needs Vector256 hardware).</summary>
        Vector256,

        /// <summary>One term at a time.</summary>
        Scalar,
    }

    /// <summary>The series' value and its derivative with respect to t.</summary>
    public (double Value, double Rate) Evaluate(double t) => Evaluate(t, SumWidth.Widest);

    /// <summary>The series' value and its derivative, summed at the given width.</summary>
    internal (double Value, double Rate) Evaluate(double t, SumWidth width)
    {
        double value = 0, rate = 0;
        foreach (var g in _groups)
        {
            var (sum, sumRate) = g.Sum(t, width);
            var tk = g.Power == 0 ? 1.0 : Math.Pow(t, g.Power);
            var dtk = g.Power == 0 ? 0.0 : g.Power * Math.Pow(t, g.Power - 1);
            value += tk * sum;
            rate += dtk * sum + tk * sumRate;
        }
        return (value, rate);
    }

    private sealed class PowerGroup
    {
        // Terms are padded to a multiple of 8, so both 4- and 8-lane sums read whole vectors.
        private const int Lanes = 8;
        private readonly double[] _a, _p0, _p1, _p2, _p3, _p4;
        private readonly bool _linearPhase;

        public int Power { get; }

        public int Count { get; }

        public PowerGroup(int power, double[][] rows, double phaseShift)
        {
            Power = power;
            Count = rows.Length;
            var padded = (rows.Length + Lanes - 1) / Lanes * Lanes;
            _a = new double[padded];
            _p0 = new double[padded];
            _p1 = new double[padded];
            _p2 = new double[padded];
            _p3 = new double[padded];
            _p4 = new double[padded];
            for (var i = 0; i < rows.Length; i++)
            {
                var r = rows[i];
                _a[i] = r[0];
                _p0[i] = r[1] + phaseShift;
                _p1[i] = r[2];
                if (r.Length > 3) _p2[i] = r[3];
                if (r.Length > 4) _p3[i] = r[4];
                if (r.Length > 5) _p4[i] = r[5];
            }
            _linearPhase = _p2.All(v => v == 0) && _p3.All(v => v == 0) && _p4.All(v => v == 0);
        }

        /// <summary>Σ A·sin φ and Σ A·cos φ·φ′ at t.</summary>
        public (double Sum, double Rate) Sum(double t, SumWidth width) => width switch
        {
            SumWidth.Vector512 => SumVector512(t),
            SumWidth.Vector256 => SumVector256(t),
            SumWidth.Scalar => SumScalar(t),
            _ => Vector512.IsHardwareAccelerated ? SumVector512(t) : Vector256.IsHardwareAccelerated ? SumVector256(t) : SumScalar(t),
        };

        private (double, double) SumVector512(double t) => SumVector<Vector512<double>, Lanes512>(t);

        private (double, double) SumVector256(double t) => SumVector<Vector256<double>, Lanes256>(t);

        // One loop for every vector width, compiled once per lane type with the lanes' calls inlined. Per lane:
        // φ = p₀ + p₁t + p₂t² + p₃t³ + p₄t⁴ reduced to ±π, φ′ = p₁ + 2p₂t + 3p₃t² + 4p₄t³; sum += A·sin φ, rate += A·cos φ·φ′
        // (the operations in the order SumScalar writes them, left to right).
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private (double, double) SumVector<TVector, TLanes>(double t)
            where TLanes : struct, ILanes<TVector>
        {
            var vt = TLanes.Splat(t);
            var t2 = t * t;
            var vt2 = TLanes.Splat(t2);
            var vt3 = TLanes.Splat(t2 * t);
            var vt4 = TLanes.Splat(t2 * t2);
            var two = TLanes.Splat(2.0);
            var threeT2 = TLanes.Splat(3.0 * t2);
            var fourT3 = TLanes.Splat(4.0 * t2 * t);
            var twoPi = TLanes.Splat(2 * Math.PI);
            var invTwoPi = TLanes.Splat(1 / (2 * Math.PI));
            var sum = TLanes.Splat(0);
            var rate = TLanes.Splat(0);
            ReadOnlySpan<double> a = _a, p0 = _p0, p1 = _p1, p2 = _p2, p3 = _p3, p4 = _p4;
            for (var i = 0; i < a.Length; i += TLanes.Count)
            {
                var c1 = TLanes.Load(p1.Slice(i, TLanes.Count));
                TVector phase, phaseRate;
                if (_linearPhase)
                {
                    phase = TLanes.Add(TLanes.Load(p0.Slice(i, TLanes.Count)), TLanes.Multiply(c1, vt));
                    phaseRate = c1;
                }
                else
                {
                    var c2 = TLanes.Load(p2.Slice(i, TLanes.Count));
                    var c3 = TLanes.Load(p3.Slice(i, TLanes.Count));
                    var c4 = TLanes.Load(p4.Slice(i, TLanes.Count));
                    phase = TLanes.Add(TLanes.Load(p0.Slice(i, TLanes.Count)), TLanes.Multiply(c1, vt));
                    phase = TLanes.Add(phase, TLanes.Multiply(c2, vt2));
                    phase = TLanes.Add(phase, TLanes.Multiply(c3, vt3));
                    phase = TLanes.Add(phase, TLanes.Multiply(c4, vt4));
                    phaseRate = TLanes.Add(c1, TLanes.Multiply(TLanes.Multiply(two, c2), vt));
                    phaseRate = TLanes.Add(phaseRate, TLanes.Multiply(c3, threeT2));
                    phaseRate = TLanes.Add(phaseRate, TLanes.Multiply(c4, fourT3));
                }
                phase = TLanes.Subtract(phase, TLanes.Multiply(twoPi, TLanes.Round(TLanes.Multiply(phase, invTwoPi))));
                var (sin, cos) = TLanes.SinCos(phase);
                var amplitude = TLanes.Load(a.Slice(i, TLanes.Count));
                sum = TLanes.Add(sum, TLanes.Multiply(amplitude, sin));
                rate = TLanes.Add(rate, TLanes.Multiply(TLanes.Multiply(amplitude, cos), phaseRate));
            }
            return (TLanes.Sum(sum), TLanes.Sum(rate));
        }

        private (double, double) SumScalar(double t)
        {
            double sum = 0, rate = 0;
            for (var i = 0; i < Count; i++)
            {
                var phase = _p0[i] + t * (_p1[i] + t * (_p2[i] + t * (_p3[i] + t * _p4[i])));
                var phaseRate = _p1[i] + t * (2 * _p2[i] + t * (3 * _p3[i] + t * 4 * _p4[i]));
                var (sin, cos) = Math.SinCos(Math.IEEERemainder(phase, 2 * Math.PI));
                sum += _a[i] * sin;
                rate += _a[i] * cos * phaseRate;
            }
            return (sum, rate);
        }
    }

    // What the summing loop needs of a vector type; .NET has no public interface over the vector widths.
    private interface ILanes<TVector>
    {
        static abstract int Count { get; }

        static abstract TVector Load(ReadOnlySpan<double> values);

        static abstract TVector Splat(double value);

        static abstract TVector Round(TVector value);

        static abstract (TVector Sin, TVector Cos) SinCos(TVector value);

        static abstract double Sum(TVector value);

        static abstract TVector Add(TVector left, TVector right);

        static abstract TVector Subtract(TVector left, TVector right);

        static abstract TVector Multiply(TVector left, TVector right);
    }

    private readonly struct Lanes256 : ILanes<Vector256<double>>
    {
        public static int Count => Vector256<double>.Count;

        public static Vector256<double> Load(ReadOnlySpan<double> values) => Vector256.Create(values);

        public static Vector256<double> Splat(double value) => Vector256.Create(value);

        public static Vector256<double> Round(Vector256<double> value) => Vector256.Round(value);

        public static (Vector256<double> Sin, Vector256<double> Cos) SinCos(Vector256<double> value) => Vector256.SinCos(value);

        public static double Sum(Vector256<double> value) => Vector256.Sum(value);

        public static Vector256<double> Add(Vector256<double> left, Vector256<double> right) => left + right;

        public static Vector256<double> Subtract(Vector256<double> left, Vector256<double> right) => left - right;

        public static Vector256<double> Multiply(Vector256<double> left, Vector256<double> right) => left * right;
    }

    private readonly struct Lanes512 : ILanes<Vector512<double>>
    {
        public static int Count => Vector512<double>.Count;

        public static Vector512<double> Load(ReadOnlySpan<double> values) => Vector512.Create(values);

        public static Vector512<double> Splat(double value) => Vector512.Create(value);

        public static Vector512<double> Round(Vector512<double> value) => Vector512.Round(value);

        public static (Vector512<double> Sin, Vector512<double> Cos) SinCos(Vector512<double> value) => Vector512.SinCos(value);

        public static double Sum(Vector512<double> value) => Vector512.Sum(value);

        public static Vector512<double> Add(Vector512<double> left, Vector512<double> right) => left + right;

        public static Vector512<double> Subtract(Vector512<double> left, Vector512<double> right) => left - right;

        public static Vector512<double> Multiply(Vector512<double> left, Vector512<double> right) => left * right;
    }
}
