package org.kinduct.solver;

/** Sense of a loop current as seen on screen (z out of the screen). */
public enum Circulation { CW, CCW, NONE }
