namespace LunarShadow.Astronomy.Time;

/// <summary>
/// ΔT from the cubic spline of Stephenson, Morrison &amp; Hohenkerk (2016, Proc. R. Soc. A 472: 20160404) as
/// revised in Morrison, Stephenson, Hohenkerk &amp; Zawilski (2021, Proc. R. Soc. A 477: 20200776), Table S15.2020,
/// for −720 to 1974, and their long-term length-of-day model outside it.
/// </summary>
internal static class StephensonMorrisonHohenkerkSpline
{
    /// <summary>First year the spline covers.</summary>
    public const double FirstYear = -720;

    /// <summary>Last year the spline segments carried here cover.</summary>
    public const double LastYear = 1974;

    // Table S15.2020 (Morrison et al. 2021): segment start year, end year, and a0..a3 of ΔT = a0 + a1·t + a2·t² + a3·t³
    // with t the fraction of the segment elapsed. Published coefficients, segments up to 1974.
    private static readonly double[,] Segments =
    {
        { -720, -100, 20371.848, -9999.586, 776.247, 409.160 },
        { -100, 400, 11557.668, -5822.270, 1303.151, -503.433 },
        { 400, 1000, 6535.116, -5671.519, -298.291, 1085.087 },
        { 1000, 1150, 1650.393, -753.210, 184.811, -25.346 },
        { 1150, 1300, 1056.647, -459.628, 108.771, -24.641 },
        { 1300, 1500, 681.149, -421.345, 61.953, -29.414 },
        { 1500, 1600, 292.343, -192.841, -6.572, 16.197 },
        { 1600, 1650, 109.127, -78.697, 10.505, 3.018 },
        { 1650, 1720, 43.952, -68.089, 38.333, -2.127 },
        { 1720, 1800, 12.068, 2.507, 41.731, -37.939 },
        { 1800, 1810, 18.367, -3.481, -1.126, 1.918 },
        { 1810, 1820, 15.678, 0.021, 4.629, -3.812 },
        { 1820, 1830, 16.516, -2.157, -6.806, 3.250 },
        { 1830, 1840, 10.804, -6.018, 2.944, -0.096 },
        { 1840, 1850, 7.634, -0.416, 2.658, -0.539 },
        { 1850, 1855, 9.338, 1.642, 0.261, -0.883 },
        { 1855, 1860, 10.357, -0.486, -2.389, 1.558 },
        { 1860, 1865, 9.040, -0.591, 2.284, -2.477 },
        { 1865, 1870, 8.255, -3.456, -5.148, 2.720 },
        { 1870, 1875, 2.371, -5.593, 3.011, -0.914 },
        { 1875, 1880, -1.126, -2.314, 0.269, -0.039 },
        { 1880, 1885, -3.210, -1.893, 0.152, 0.563 },
        { 1885, 1890, -4.388, 0.101, 1.842, -1.438 },
        { 1890, 1895, -3.884, -0.531, -2.474, 1.871 },
        { 1895, 1900, -5.017, 0.134, 3.138, -0.232 },
        { 1900, 1905, -1.977, 5.715, 2.443, -1.257 },
        { 1905, 1910, 4.923, 6.828, -1.329, 0.720 },
        { 1910, 1915, 11.142, 6.330, 0.831, -0.825 },
        { 1915, 1920, 17.479, 5.518, -1.643, 0.262 },
        { 1920, 1925, 21.617, 3.020, -0.856, 0.008 },
        { 1925, 1930, 23.789, 1.333, -0.831, 0.127 },
        { 1930, 1935, 24.418, 0.052, -0.449, 0.142 },
        { 1935, 1940, 24.164, -0.419, -0.022, 0.702 },
        { 1940, 1945, 24.426, 1.645, 2.086, -1.106 },
        { 1945, 1950, 27.050, 2.499, -1.232, 0.614 },
        { 1950, 1953, 28.932, 1.127, 0.220, -0.277 },
        { 1953, 1956, 30.002, 0.737, -0.610, 0.631 },
        { 1956, 1959, 30.760, 1.409, 1.282, -0.799 },
        { 1959, 1962, 32.652, 1.577, -1.115, 0.507 },
        { 1962, 1965, 33.621, 0.868, 0.406, 0.199 },
        { 1965, 1968, 35.093, 2.275, 1.002, -0.414 },
        { 1968, 1971, 37.956, 3.035, -0.242, 0.202 },
        { 1971, 1974, 40.951, 3.157, 0.364, -0.229 },
    };

    /// <summary>ΔT in seconds from the spline, for −720 ≤ year ≤ 1974.</summary>
    public static double Spline(double year)
    {
        if (year < FirstYear || year > LastYear) throw new ArgumentOutOfRangeException(nameof(year));
        var i = 0;
        while (i < Segments.GetLength(0) - 1 && year >= Segments[i + 1, 0]) i++;
        var t = (year - Segments[i, 0]) / (Segments[i, 1] - Segments[i, 0]);
        return Segments[i, 2] + t * (Segments[i, 3] + t * (Segments[i, 4] + t * Segments[i, 5]));
    }

    // Morrison et al. (2021): long-term excess length of day lod = 1.72·t − 3.5·sin(2π(t + 0.75)/14) ms, t in centuries
    // from 1825; integrated here to ΔT in seconds up to a constant: 31.4115·t² + (127.8375/ω)·cos(ω(t + 0.75)), ω = 2π/14.
    /// <summary>The integrated long-term length-of-day model, without its integration constant.</summary>
    public static double IntegratedLengthOfDay(double year)
    {
        const double omega = 2 * Math.PI / 14;
        var t = (year - 1825) / 100;
        return 31.4115 * t * t + 127.8375 / omega * Math.Cos(omega * (t + 0.75));
    }
}
