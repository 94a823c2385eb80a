namespace LunarShadow.Astronomy.Units;

/// <summary>A 3×3 rotation matrix, row-major; applied to column vectors (r' = M·r).</summary>
public readonly record struct RotationMatrix(
    double M11, double M12, double M13,
    double M21, double M22, double M23,
    double M31, double M32, double M33)
{
    /// <summary>The identity.</summary>
    public static RotationMatrix Identity => new(1, 0, 0, 0, 1, 0, 0, 0, 1);

    /// <summary>Rotation of the frame about the x axis by the angle (SOFA convention R1).</summary>
    public static RotationMatrix AboutX(double radians)
    {
        var (s, c) = Math.SinCos(radians);
        return new(1, 0, 0, 0, c, s, 0, -s, c);
    }

    /// <summary>Rotation of the frame about the y axis by the angle (SOFA convention R2).</summary>
    public static RotationMatrix AboutY(double radians)
    {
        var (s, c) = Math.SinCos(radians);
        return new(c, 0, -s, 0, 1, 0, s, 0, c);
    }

    /// <summary>Rotation of the frame about the z axis by the angle (SOFA convention R3).</summary>
    public static RotationMatrix AboutZ(double radians)
    {
        var (s, c) = Math.SinCos(radians);
        return new(c, s, 0, -s, c, 0, 0, 0, 1);
    }

    /// <summary>A matrix whose rows are the three given vectors.</summary>
    public static RotationMatrix FromRows(CartesianVector r1, CartesianVector r2, CartesianVector r3) =>
        new(r1.X, r1.Y, r1.Z, r2.X, r2.Y, r2.Z, r3.X, r3.Y, r3.Z);

    /// <summary>The inverse (the transpose, for a rotation).</summary>
    public RotationMatrix Transposed() => new(M11, M21, M31, M12, M22, M32, M13, M23, M33);

    /// <summary>Applies the matrix to a vector.</summary>
    public static CartesianVector operator *(RotationMatrix m, CartesianVector v) => new(
        m.M11 * v.X + m.M12 * v.Y + m.M13 * v.Z,
        m.M21 * v.X + m.M22 * v.Y + m.M23 * v.Z,
        m.M31 * v.X + m.M32 * v.Y + m.M33 * v.Z);

    /// <summary>Matrix product: (a·b)·r = a·(b·r).</summary>
    public static RotationMatrix operator *(RotationMatrix a, RotationMatrix b) => new(
        a.M11 * b.M11 + a.M12 * b.M21 + a.M13 * b.M31, a.M11 * b.M12 + a.M12 * b.M22 + a.M13 * b.M32, a.M11 * b.M13 + a.M12 * b.M23 + a.M13 * b.M33,
        a.M21 * b.M11 + a.M22 * b.M21 + a.M23 * b.M31, a.M21 * b.M12 + a.M22 * b.M22 + a.M23 * b.M32, a.M21 * b.M13 + a.M22 * b.M23 + a.M23 * b.M33,
        a.M31 * b.M11 + a.M32 * b.M21 + a.M33 * b.M31, a.M31 * b.M12 + a.M32 * b.M22 + a.M33 * b.M32, a.M31 * b.M13 + a.M32 * b.M23 + a.M33 * b.M33);
}
