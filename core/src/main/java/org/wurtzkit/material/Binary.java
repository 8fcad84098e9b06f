package org.wurtzkit.material;

/** The three wurtzite binary nitrides from which every alloy is resolved. */
public enum Binary {
    /** Gallium nitride. */
    GAN("GaN"),
    /** Aluminium nitride. */
    ALN("AlN"),
    /** Indium nitride. */
    INN("InN");

    private final String formula;

    Binary(String formula) {
        this.formula = formula;
    }

    /** {@return the chemical formula, e.g. "GaN" (also the key prefix in parameter-set files)} */
    public String formula() {
        return formula;
    }

    /**
     * @param formula "GaN", "AlN" or "InN" (case-sensitive)
     * @return the binary
     * @throws org.wurtzkit.errors.InvalidParameterException for any other text
     */
    public static Binary ofFormula(String formula) {
        for (Binary b : values()) {
            if (b.formula.equals(formula)) {
                return b;
            }
        }
        throw new org.wurtzkit.errors.InvalidParameterException("binary formula", "\"" + formula + "\"",
                "{GaN, AlN, InN}");
    }
}
