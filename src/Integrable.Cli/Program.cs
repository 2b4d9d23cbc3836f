using Integrable.Numbers;
Console.WriteLine(new Rational(6, -4) * new Rational(6, -4) + 1);
