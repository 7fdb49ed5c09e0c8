package date

import "math"

// Astronomy for the lunisolar calendars: the moments of new moons and of
// the sun's arrival at a longitude, in Julian Days of Universal Time.
//
// New moons follow J. Meeus, Astronomical Algorithms (2nd ed., 1998),
// chapter 49 (the mean phase with its periodic and planetary terms), as E.
// M. Reingold and N. Dershowitz use it (Calendrical Calculations,
// "nth-new-moon"). The sun's apparent longitude is theirs too: the
// 49-term series of P. Bretagnon and J.-L. Simon (Planetary Programs and
// Tables, 1986) with aberration and nutation. ΔT (TT − UT) uses the
// polynomials of F. Espenak and J. Meeus (NASA, Five Millennium Canon of
// Solar Eclipses, 2006), as remembered; the uncertainty margins of the
// calendars are far larger than their error.

const (
	meanSynodicMonth = 29.530588861
	meanTropicalYear = 365.242189
	j2000            = 2451545.0
)

func sinDeg(x float64) float64 { return math.Sin(x * math.Pi / 180) }
func cosDeg(x float64) float64 { return math.Cos(x * math.Pi / 180) }

// deltaT is TT − UT in days at the Julian Day jd (a decimal year from it).
func deltaT(jd float64) float64 {
	y := 2000 + (jd-j2000)/365.2425
	var s float64
	switch {
	case y < 500:
		u := y / 100
		s = 10583.6 - 1014.41*u + 33.78311*u*u - 5.952053*u*u*u - 0.1798452*u*u*u*u + 0.022174192*u*u*u*u*u + 0.0090316521*u*u*u*u*u*u
	case y < 1600:
		u := (y - 1000) / 100
		s = 1574.2 - 556.01*u + 71.23472*u*u + 0.319781*u*u*u - 0.8503463*u*u*u*u - 0.005050998*u*u*u*u*u + 0.0083572073*u*u*u*u*u*u
	case y < 1700:
		t := y - 1600
		s = 120 - 0.9808*t - 0.01532*t*t + t*t*t/7129
	case y < 1800:
		t := y - 1700
		s = 8.83 + 0.1603*t - 0.0059285*t*t + 0.00013336*t*t*t - t*t*t*t/1174000
	case y < 1860:
		t := y - 1800
		s = 13.72 - 0.332447*t + 0.0068612*t*t + 0.0041116*t*t*t - 0.00037436*math.Pow(t, 4) +
			0.0000121272*math.Pow(t, 5) - 0.0000001699*math.Pow(t, 6) + 0.000000000875*math.Pow(t, 7)
	case y < 1900:
		t := y - 1860
		s = 7.62 + 0.5737*t - 0.251754*t*t + 0.01680668*t*t*t - 0.0004473624*math.Pow(t, 4) + math.Pow(t, 5)/233174
	case y < 1920:
		t := y - 1900
		s = -2.79 + 1.494119*t - 0.0598939*t*t + 0.0061966*t*t*t - 0.000197*math.Pow(t, 4)
	case y < 1941:
		t := y - 1920
		s = 21.20 + 0.84493*t - 0.076100*t*t + 0.0020936*t*t*t
	case y < 1961:
		t := y - 1950
		s = 29.07 + 0.407*t - t*t/233 + t*t*t/2547
	case y < 1986:
		t := y - 1975
		s = 45.45 + 1.067*t - t*t/260 - t*t*t/718
	case y < 2005:
		t := y - 2000
		s = 63.86 + 0.3345*t - 0.060374*t*t + 0.0017275*t*t*t + 0.000651814*math.Pow(t, 4) + 0.00002373599*math.Pow(t, 5)
	case y < 2050:
		t := y - 2000
		s = 62.92 + 0.32217*t + 0.005589*t*t
	case y < 2150:
		u := (y - 1820) / 100
		s = -20 + 32*u*u - 0.5628*(2150-y)
	default:
		u := (y - 1820) / 100
		s = -20 + 32*u*u
	}
	return s / 86400
}

// newMoonTT returns the moment of the new moon of lunation k (k = 0 is the
// new moon of 6 January 2000) in Julian Ephemeris Days (TT): Meeus,
// chapter 49.
func newMoonTT(k float64) float64 {
	t := k / 1236.85
	jde := 2451550.09766 + 29.530588861*k + 0.00015437*t*t - 0.000000150*t*t*t + 0.00000000073*t*t*t*t
	e := 1 - 0.002516*t - 0.0000074*t*t
	m := 2.5534 + 29.10535670*k - 0.0000014*t*t - 0.00000011*t*t*t
	mp := 201.5643 + 385.81693528*k + 0.0107582*t*t + 0.00001238*t*t*t - 0.000000058*t*t*t*t
	f := 160.7108 + 390.67050284*k - 0.0016118*t*t - 0.00000227*t*t*t + 0.000000011*t*t*t*t
	om := 124.7746 - 1.56375588*k + 0.0020672*t*t + 0.00000215*t*t*t
	corr := -0.40720*sinDeg(mp) + 0.17241*e*sinDeg(m) + 0.01608*sinDeg(2*mp) + 0.01039*sinDeg(2*f) +
		0.00739*e*sinDeg(mp-m) - 0.00514*e*sinDeg(mp+m) + 0.00208*e*e*sinDeg(2*m) - 0.00111*sinDeg(mp-2*f) -
		0.00057*sinDeg(mp+2*f) + 0.00056*e*sinDeg(2*mp+m) - 0.00042*sinDeg(3*mp) + 0.00042*e*sinDeg(m+2*f) +
		0.00038*e*sinDeg(m-2*f) - 0.00024*e*sinDeg(2*mp-m) - 0.00017*sinDeg(om) - 0.00007*sinDeg(mp+2*m) +
		0.00004*sinDeg(2*mp-2*f) + 0.00004*sinDeg(3*m) + 0.00003*sinDeg(mp+m-2*f) + 0.00003*sinDeg(2*mp+2*f) -
		0.00003*sinDeg(mp+m+2*f) + 0.00003*sinDeg(mp-m+2*f) - 0.00002*sinDeg(mp-m-2*f) - 0.00002*sinDeg(3*mp+m) +
		0.00002*sinDeg(4*mp)
	planets := [...][3]float64{ // argument at k = 0, per lunation, coefficient
		{299.77, 0.107408, 0.000325}, {251.88, 0.016321, 0.000165}, {251.83, 26.651886, 0.000164},
		{349.42, 36.412478, 0.000126}, {84.66, 18.206239, 0.000110}, {141.74, 53.303771, 0.000062},
		{207.14, 2.453732, 0.000060}, {154.84, 7.306860, 0.000056}, {34.52, 27.261239, 0.000047},
		{207.19, 0.121824, 0.000042}, {291.34, 1.844379, 0.000040}, {161.72, 24.198154, 0.000037},
		{239.56, 25.513099, 0.000035}, {331.55, 3.592518, 0.000023},
	}
	var add float64
	for i, a := range planets {
		arg := a[0] + a[1]*k
		if i == 0 {
			arg -= 0.009173 * t * t
		}
		add += a[2] * sinDeg(arg)
	}
	return jde + corr + add
}

// newMoon returns the moment of new moon k in Julian Days of UT.
func newMoon(k float64) float64 {
	jde := newMoonTT(k)
	return jde - deltaT(jde)
}

// newMoonIndex returns the lunation number of the first new moon at or
// after jd (UT).
func newMoonIndex(jd float64) float64 {
	k := math.Floor((jd-2451550.09766)/meanSynodicMonth) - 1
	for newMoon(k) < jd {
		k++
	}
	for newMoon(k-1) >= jd {
		k--
	}
	return k
}

// solarTerms is the series of Bretagnon and Simon for the sun's longitude:
// amplitude (in 10⁻⁷ radians… as scaled below), phase, rate per century.
var solarTerms = [...][3]float64{
	{403406, 270.54861, 0.9287892}, {195207, 340.19128, 35999.1376958}, {119433, 63.91854, 35999.4089666},
	{112392, 331.26220, 35998.7287385}, {3891, 317.843, 71998.20261}, {2819, 86.631, 71998.4403},
	{1721, 240.052, 36000.35726}, {660, 310.26, 71997.4812}, {350, 247.23, 32964.4678},
	{334, 260.87, -19.4410}, {314, 297.82, 445267.1117}, {268, 343.14, 45036.8840},
	{242, 166.79, 3.1008}, {234, 81.53, 22518.4434}, {158, 3.50, -19.9739},
	{132, 132.75, 65928.9345}, {129, 182.95, 9038.0293}, {114, 162.03, 3034.7684},
	{99, 29.8, 33718.148}, {93, 266.4, 3034.448}, {86, 249.2, -2280.773},
	{78, 157.6, 29929.992}, {72, 257.8, 31556.493}, {68, 185.1, 149.588},
	{64, 69.9, 9037.750}, {46, 8.0, 107997.405}, {38, 197.1, -4444.176},
	{37, 250.4, 151.771}, {32, 65.3, 67555.316}, {29, 162.7, 31556.080},
	{28, 341.5, -4561.540}, {27, 291.6, 107996.706}, {27, 98.5, 1221.655},
	{25, 146.7, 62894.167}, {24, 110.0, 31437.369}, {21, 5.2, 14578.298},
	{21, 342.6, -31931.757}, {20, 230.9, 34777.243}, {18, 256.1, 1221.999},
	{17, 45.3, 62894.511}, {14, 242.9, -4442.039}, {13, 115.2, 107997.909},
	{13, 151.8, 119.066}, {13, 285.3, 16859.071}, {12, 53.3, -4.578},
	{10, 126.6, 26895.292}, {10, 205.7, -39.127}, {10, 85.9, 12297.536},
	{10, 146.1, 90073.778},
}

// solarLongitude is the sun's apparent longitude in degrees [0, 360) at
// the moment jd (UT).
func solarLongitude(jd float64) float64 {
	c := (jd + deltaT(jd) - j2000) / 36525
	var sum float64
	for _, a := range solarTerms {
		sum += a[0] * sinDeg(a[1]+a[2]*c)
	}
	lam := 282.7771834 + 36000.76953744*c + 0.000005729577951308232*sum
	aberration := 0.0000974*cosDeg(177.63+35999.01848*c) - 0.005575
	nutation := -0.004778*sinDeg(124.90-1934.134*c+0.002063*c*c) - 0.0003667*sinDeg(201.11+72001.5377*c+0.00057*c*c)
	return math.Mod(math.Mod(lam+aberration+nutation, 360)+360, 360)
}

// solarLongitudeAfter returns the first moment (UT) at or after jd when the
// sun's longitude is lam degrees: a first guess at the mean rate, then
// Newton's steps at that rate (the true rate differs from it by 3.4 % at
// most, so that each step gains a factor of about 30), to a millionth of
// a degree (a tenth of a second).
func solarLongitudeAfter(lam, jd float64) float64 {
	rate := meanTropicalYear / 360
	tau := jd + rate*math.Mod(math.Mod(lam-solarLongitude(jd), 360)+360, 360)
	for range 12 {
		d := math.Mod(math.Mod(lam-solarLongitude(tau)+180, 360)+360, 360) - 180
		tau += d * rate
		if math.Abs(d) < 1e-6 {
			break
		}
	}
	return tau
}

// localDay is the calendar day holding the moment jd (UT) at a place or
// zone offset hours east of Greenwich.
func localDay(jd, hours float64) Day {
	return Day(math.Floor(jd + 0.5 + hours/24))
}

// autumnEquinoxDay is the day, in local mean time at longitude lon (degrees
// east), of the autumn equinox of Gregorian year y.
func autumnEquinoxDay(y int64, lon float64) Day {
	start := float64(Gregorian(y, 9, 1))
	return localDay(solarLongitudeAfter(180, start), lon/15)
}
