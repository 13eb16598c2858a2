/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Solution Method</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The solution used to compute a flushing design.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getSolutionMethod()
 * @model
 * @generated
 */
public enum SolutionMethod implements Enumerator {
	/**
	 * The '<em><b>EQUILIBRIUM</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Analytical equilibrium advection-dispersion solution (Brenner 1962; van Genuchten and Alves 1982).
	 * <!-- end-model-doc -->
	 * @see #EQUILIBRIUM_VALUE
	 * @generated
	 * @ordered
	 */
	EQUILIBRIUM(0, "EQUILIBRIUM", "EQUILIBRIUM"),

	/**
	 * The '<em><b>TWO REGION</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Two-region / two-site nonequilibrium (van Genuchten and Wierenga 1976).
	 * <!-- end-model-doc -->
	 * @see #TWO_REGION_VALUE
	 * @generated
	 * @ordered
	 */
	TWO_REGION(1, "TWO_REGION", "TWO_REGION"),

	/**
	 * The '<em><b>NUMERICAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Numerical finite-volume solution with layered properties and nonlinear sorption.
	 * <!-- end-model-doc -->
	 * @see #NUMERICAL_VALUE
	 * @generated
	 * @ordered
	 */
	NUMERICAL(2, "NUMERICAL", "NUMERICAL");

	/**
	 * The '<em><b>EQUILIBRIUM</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Analytical equilibrium advection-dispersion solution (Brenner 1962; van Genuchten and Alves 1982).
	 * <!-- end-model-doc -->
	 * @see #EQUILIBRIUM
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int EQUILIBRIUM_VALUE = 0;

	/**
	 * The '<em><b>TWO REGION</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Two-region / two-site nonequilibrium (van Genuchten and Wierenga 1976).
	 * <!-- end-model-doc -->
	 * @see #TWO_REGION
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int TWO_REGION_VALUE = 1;

	/**
	 * The '<em><b>NUMERICAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Numerical finite-volume solution with layered properties and nonlinear sorption.
	 * <!-- end-model-doc -->
	 * @see #NUMERICAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int NUMERICAL_VALUE = 2;

	/**
	 * An array of all the '<em><b>Solution Method</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final SolutionMethod[] VALUES_ARRAY =
		new SolutionMethod[] {
			EQUILIBRIUM,
			TWO_REGION,
			NUMERICAL,
		};

	/**
	 * A public read-only list of all the '<em><b>Solution Method</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<SolutionMethod> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Solution Method</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SolutionMethod get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SolutionMethod result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Solution Method</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SolutionMethod getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SolutionMethod result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Solution Method</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SolutionMethod get(int value) {
		switch (value) {
			case EQUILIBRIUM_VALUE: return EQUILIBRIUM;
			case TWO_REGION_VALUE: return TWO_REGION;
			case NUMERICAL_VALUE: return NUMERICAL;
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
	private SolutionMethod(int value, String name, String literal) {
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
	
} //SolutionMethod
