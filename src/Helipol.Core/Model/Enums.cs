namespace Helipol.Model;

/// <summary>dipole: centre-fed in free space, centred at z = 0; monopole: on a perfect ground plane at z = 0.</summary>
public enum WhipKind { Dipole, Monopole }

/// <summary>Sense of circular polarization per IEEE Std 145 (right-hand = clockwise seen in the direction of propagation).</summary>
public enum Sense { Rhcp, Lhcp }

/// <summary>Right: azimuth increases as the element rises (a right-handed helix). Auto: the solver picks.</summary>
public enum Winding { Auto, Left, Right }

public enum Objective { WorstAxialRatio, MeanAxialRatio }

public enum Paper { A4, Letter }
