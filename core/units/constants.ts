/**
 * Physical and astronomical constants, in SI unless the name says otherwise.
 *
 * Each constant names its source; derived constants show their derivation.
 * Nothing else in zcell hard-codes a physical number.
 */

/** Speed of light in vacuum [m/s]. Exact by definition of the metre (SI 2019). */
export const speedOfLightMPerS = 299_792_458;

/** Speed of light in vacuum [km/s]. Derived: speedOfLightMPerS / 1000. */
export const speedOfLightKmPerS = speedOfLightMPerS / 1000;

/** Astronomical unit [m]. Exact by IAU 2012 Resolution B2. */
export const auM = 149_597_870_700;

/** Parsec [m]. IAU 2015 Resolution B2: 1 pc = 648000/π au exactly. */
export const parsecM = (648_000 / Math.PI) * auM;

/** Megaparsec [m]. Derived: 1e6 pc. */
export const megaparsecM = 1e6 * parsecM;

/** Megaparsec [km]. Derived: megaparsecM / 1000. */
export const megaparsecKm = megaparsecM / 1000;

/** Julian year [s]: 365.25 days of 86400 s (IAU; common practice in astronomy). */
export const julianYearS = 365.25 * 86_400;

/** Gigayear [s]. Derived: 1e9 Julian years. */
export const secondsPerGyr = 1e9 * julianYearS;

/** Light year [m]: distance light travels in one Julian year (IAU). Derived: c × julianYearS. */
export const lightYearM = speedOfLightMPerS * julianYearS;

/** Newtonian constant of gravitation [m³ kg⁻¹ s⁻²]. CODATA 2018 recommended value. */
export const gravitationalConstantSI = 6.6743e-11;

/** Stefan–Boltzmann constant [W m⁻² K⁻⁴]. Exact in SI 2019 (derived from exact h, k, c). */
export const stefanBoltzmannSI = 5.670374419e-8;

/** Boltzmann constant [J/K]. Exact in SI 2019 (BIPM, The International System of Units, 9th ed., 2019). */
export const boltzmannJPerK = 1.380649e-23;

/** Boltzmann constant [eV/K]. CODATA 2018 (exact in SI 2019: k/e = 1.380649e-23 / 1.602176634e-19). */
export const boltzmannEvPerK = 8.617333262e-5;

/** Nominal solar luminosity [W]. IAU 2015 Resolution B3. */
export const solarLuminosityW = 3.828e26;

/** Zero point of the absolute bolometric magnitude scale [W]: M_bol = −2.5 log10(L / L0). IAU 2015 Resolution B2. */
export const bolometricZeroPointW = 3.0128e28;

/** Nominal solar mass parameter GM☉ [m³ s⁻²]. IAU 2015 Resolution B3. */
export const solarMassParameterSI = 1.3271244e20;

/** Solar mass [kg]. Derived: IAU 2015 B3 nominal GM☉ / G (CODATA 2018) ≈ 1.98841e30 kg. */
export const solarMassKg = solarMassParameterSI / gravitationalConstantSI;

/** Jansky [W m⁻² Hz⁻¹]. IAU: 1 Jy = 1e-26 W m⁻² Hz⁻¹. */
export const janskySI = 1e-26;

/** erg [J]. CGS: 1 erg = 1e-7 J. */
export const ergJ = 1e-7;

/**
 * AB magnitude offset: m_AB = −2.5 log10(f_ν / (erg s⁻¹ cm⁻² Hz⁻¹)) − 48.60 (Oke & Gunn 1983, ApJ 266, 713).
 * The zero point this implies is f_ν = 10^(−48.60/2.5) erg s⁻¹ cm⁻² Hz⁻¹ = 3.630781e-20 erg s⁻¹ cm⁻² Hz⁻¹
 * = 3630.78 Jy (derived: 1 erg s⁻¹ cm⁻² Hz⁻¹ = 1e-3 W m⁻² Hz⁻¹ = 1e23 Jy).
 */
export const abMagnitudeOffset = 48.6;

/** Flux density of AB magnitude 0 [Jy]. Derived from abMagnitudeOffset: 1e23 × 10^(−48.6/2.5) ≈ 3630.78 Jy. */
export const abZeroPointJy = 1e23 * 10 ** (-abMagnitudeOffset / 2.5);

/** Radian per arcsecond. Derived: π / (180 × 3600). */
export const radPerArcsec = Math.PI / 648_000;

/**
 * Neutrino to photon temperature ratio after e± annihilation, (4/11)^(1/3)
 * (standard instantaneous-decoupling result; e.g. Weinberg, Cosmology, 2008, §3.1).
 */
export const neutrinoTemperatureRatio = Math.cbrt(4 / 11);

/**
 * Energy density of one massless neutrino species, with its antiparticle, relative to photons at
 * Neff = 3: (7/8)(4/11)^(4/3) ≈ 0.2271 (Fermi–Dirac vs Bose–Einstein factor 7/8 times T_ν⁴/T_γ⁴).
 */
export const neutrinoToPhotonDensityPerSpecies = (7 / 8) * (4 / 11) ** (4 / 3);

/** Planck constant [J s]. Exact in SI 2019 (BIPM, The International System of Units, 9th ed., 2019). */
export const planckConstantJs = 6.62607015e-34;

/** Electronvolt [J]. Exact in SI 2019: the elementary charge 1.602176634e-19 C times 1 V. */
export const electronVoltJ = 1.602176634e-19;

/** Ångström [m]: 1e-10 m (FITS 4.0, Pence et al. 2010, Table 5, symbol "Angstrom"). */
export const angstromM = 1e-10;

/**
 * The Sun's speed with respect to the CMB [km/s], from the CMB dipole: 369.82 km/s (Planck 2018 I,
 * A&A 641, A1, 2020; from memory).
 */
export const cmbDipoleSpeedKmPerS = 369.82;

/**
 * Direction of the CMB dipole (the apex of the Sun's motion) in galactic coordinates [deg]:
 * (l, b) = (264.021°, 48.253°) (Planck 2018 I, A&A 641, A1, 2020; confirmed as quoted from it in
 * https://www.aanda.org/articles/aa/full_html/2021/02/aa38845-20/F10.html).
 */
export const cmbDipoleGalacticDeg = { l: 264.021, b: 48.253 } as const;

/**
 * The galactic frame in ICRS [deg]: the north galactic pole at RA 192.85948°, Dec 27.12825°, and the
 * galactic longitude of the north celestial pole, 122.93192° (The Hipparcos Catalogue, ESA SP-1200,
 * 1997, Vol. 1, §1.5.3).
 */
export const galacticFrameDeg = { poleRa: 192.85948, poleDec: 27.12825, celestialPoleL: 122.93192 } as const;

/**
 * The CMB temperature today [K]: 2.7255 K (Fixsen 2009, ApJ 707, 916; the value of the Planck 2018
 * presets). The sound-horizon fit of baoScales.ts was made at it.
 */
export const cmbTemperatureK = 2.7255;

/**
 * The standard effective number of neutrino species, 3.046 (Mangano et al. 2005, Nucl. Phys. B 729,
 * 221: three species with non-instantaneous decoupling; the value of the Planck 2018 presets). The
 * sound-horizon fit of baoScales.ts was made at it.
 */
export const standardNeff = 3.046;

/**
 * Obliquity of the ecliptic at J2000.0, ε0 = 84381.406″ [arcsec] (IAU 2006 Resolution B1, which adopts
 * the P03 precession of Capitaine, Wallace & Chapront 2003, A&A 412, 567; the value of the IERS
 * Conventions 2010, IERS Technical Note 36, §5.6.4, from memory).
 */
export const eclipticObliquityJ2000Arcsec = 84381.406;

/**
 * The supergalactic frame in galactic coordinates [deg]: the north supergalactic pole at l = 47.37°,
 * b = +6.32°, and the zero of supergalactic longitude at l = 137.37°, b = 0° (de Vaucouleurs' plane
 * as adopted in the Third Reference Catalogue, de Vaucouleurs et al. 1991, and by Lahav et al. 2000,
 * MNRAS 312, 166, §2; from memory).
 */
export const supergalacticFrameDeg = { poleL: 47.37, poleB: 6.32, originL: 137.37 } as const;
