/**
 * Physical constants and unit conversions. {@link org.wurtzkit.units.Constants} holds the CODATA
 * 2018 recommended values (E. Tiesinga, P. J. Mohr, D. B. Newell and B. N. Taylor, Rev. Mod. Phys.
 * 93, 025010 (2021)) and is the only place in the library where a constant of nature is written
 * down. {@link org.wurtzkit.units.Units} converts between the SI units used inside the library and
 * the units the trade speaks (nm, &Aring;, cm<sup>-2</sup>, cm<sup>-3</sup>, GPa); each method's
 * name says which way it converts. Energies at the public API are in eV; any other non-SI accessor
 * carries its unit in its name.
 */
package org.wurtzkit.units;
