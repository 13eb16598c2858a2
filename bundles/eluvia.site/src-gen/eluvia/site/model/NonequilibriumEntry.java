/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Nonequilibrium Entry</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Whether and how nonequilibrium parameters are given (van Genuchten and Wierenga 1976; Nkedi-Kizza et al. 1984).
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getNonequilibriumEntry()
 * @model
 * @generated
 */
public enum NonequilibriumEntry implements Enumerator {
	/**
	 * The '<em><b>EQUILIBRIUM</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Local equilibrium: no nonequilibrium parameters.
	 * <!-- end-model-doc -->
	 * @see #EQUILIBRIUM_VALUE
	 * @generated
	 * @ordered
	 */
	EQUILIBRIUM(0, "EQUILIBRIUM", "EQUILIBRIUM"),

	/**
	 * The '<em><b>DIMENSIONLESS</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * beta and omega entered directly.
	 * <!-- end-model-doc -->
	 * @see #DIMENSIONLESS_VALUE
	 * @generated
	 * @ordered
	 */
	DIMENSIONLESS(1, "DIMENSIONLESS", "DIMENSIONLESS"),

	/**
	 * The '<em><b>PHYSICAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Two-region (mobile/immobile water): mobile water fraction, mobile site fraction f and transfer rate alpha.
	 * <!-- end-model-doc -->
	 * @see #PHYSICAL_VALUE
	 * @generated
	 * @ordered
	 */
	PHYSICAL(2, "PHYSICAL", "PHYSICAL"),

	/**
	 * The '<em><b>CHEMICAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Two-site (instantaneous/kinetic sorption): instantaneous site fraction F and rate k.
	 * <!-- end-model-doc -->
	 * @see #CHEMICAL_VALUE
	 * @generated
	 * @ordered
	 */
	CHEMICAL(3, "CHEMICAL", "CHEMICAL");

	/**
	 * The '<em><b>EQUILIBRIUM</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Local equilibrium: no nonequilibrium parameters.
	 * <!-- end-model-doc -->
	 * @see #EQUILIBRIUM
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int EQUILIBRIUM_VALUE = 0;

	/**
	 * The '<em><b>DIMENSIONLESS</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * beta and omega entered directly.
	 * <!-- end-model-doc -->
	 * @see #DIMENSIONLESS
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int DIMENSIONLESS_VALUE = 1;

	/**
	 * The '<em><b>PHYSICAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Two-region (mobile/immobile water): mobile water fraction, mobile site fraction f and transfer rate alpha.
	 * <!-- end-model-doc -->
	 * @see #PHYSICAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int PHYSICAL_VALUE = 2;

	/**
	 * The '<em><b>CHEMICAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Two-site (instantaneous/kinetic sorption): instantaneous site fraction F and rate k.
	 * <!-- end-model-doc -->
	 * @see #CHEMICAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int CHEMICAL_VALUE = 3;

	/**
	 * An array of all the '<em><b>Nonequilibrium Entry</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final NonequilibriumEntry[] VALUES_ARRAY =
		new NonequilibriumEntry[] {
			EQUILIBRIUM,
			DIMENSIONLESS,
			PHYSICAL,
			CHEMICAL,
		};

	/**
	 * A public read-only list of all the '<em><b>Nonequilibrium Entry</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<NonequilibriumEntry> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Nonequilibrium Entry</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static NonequilibriumEntry get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			NonequilibriumEntry result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Nonequilibrium Entry</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static NonequilibriumEntry getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			NonequilibriumEntry result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Nonequilibrium Entry</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static NonequilibriumEntry get(int value) {
		switch (value) {
			case EQUILIBRIUM_VALUE: return EQUILIBRIUM;
			case DIMENSIONLESS_VALUE: return DIMENSIONLESS;
			case PHYSICAL_VALUE: return PHYSICAL;
			case CHEMICAL_VALUE: return CHEMICAL;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private NonequilibriumEntry(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
	  return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //NonequilibriumEntry
