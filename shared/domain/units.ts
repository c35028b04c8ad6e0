// Unit-bearing names for plain numbers: the type says what the number measures.
export type Ohms = number;
export type Volts = number;
export type Celsius = number;
export type Seconds = number;
export type Inches = number;
export type Millimetres = number;
export type Feet = number;
export type Metres = number;
export type Percent = number;
export type Degrees = number;
export type OhmsPerThousandFeet = number;
export type InchesPerSecond = number;

export const MILLIMETRES_PER_INCH = 25.4;
export const FEET_PER_METRE = 1 / 0.3048;
