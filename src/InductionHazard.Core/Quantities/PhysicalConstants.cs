using System;

namespace InductionHazard.Quantities;

/// <summary>Physical constants in SI units, each with its source.</summary>
public static class PhysicalConstants
{
    /// <summary>
    /// Magnetic constant mu0 = 4 pi x 1e-7 H/m. The 2019 SI value (CODATA 2018: 1.25663706212e-6 H/m)
    /// differs by 5.5e-10 relative, far below any accuracy this tool claims.
    /// </summary>
    public const double VacuumPermeability = 4.0 * Math.PI * 1e-7;

    /// <summary>Speed of light in vacuum, m/s (exact by definition of the metre, SI 2019).</summary>
    public const double SpeedOfLight = 299_792_458.0;

    /// <summary>Stefan-Boltzmann constant, W/(m^2 K^4) (CODATA 2018, exact in the 2019 SI).</summary>
    public const double StefanBoltzmann = 5.670374419e-8;

    /// <summary>0 degrees Celsius in kelvin (ITS-90 definition of the Celsius scale).</summary>
    public const double ZeroCelsiusInKelvin = 273.15;

    /// <summary>Standard acceleration of gravity, m/s^2 (CGPM 1901, conventional value).</summary>
    public const double StandardGravity = 9.80665;

    /// <summary>The reference temperature of resistivity and its temperature coefficient, degrees Celsius (IEC 60028).</summary>
    public const double ReferenceCelsius = 20.0;
}
