/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Uncertainty Sampling</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * How the Monte Carlo sample is drawn.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getUncertaintySampling()
 * @model
 * @generated
 */
public enum UncertaintySampling implements Enumerator {
	/**
	 * The '<em><b>LATIN HYPERCUBE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Latin hypercube: one draw in each of n equally probable strata of every input (McKay, Beckman and Conover 1979).
	 * <!-- end-model-doc -->
	 * @see #LATIN_HYPERCUBE_VALUE
	 * @generated
	 * @ordered
	 */
	LATIN_HYPERCUBE(0, "LATIN_HYPERCUBE", "LATIN_HYPERCUBE"),

	/**
	 * The '<em><b>PLAIN</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Plain (simple random) Monte Carlo sampling.
	 * <!-- end-model-doc -->
	 * @see #PLAIN_VALUE
	 * @generated
	 * @ordered
	 */
	PLAIN(1, "PLAIN", "PLAIN");

	/**
	 * The '<em><b>LATIN HYPERCUBE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Latin hypercube: one draw in each of n equally probable strata of every input (McKay, Beckman and Conover 1979).
	 * <!-- end-model-doc -->
	 * @see #LATIN_HYPERCUBE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int LATIN_HYPERCUBE_VALUE = 0;

	/**
	 * The '<em><b>PLAIN</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Plain (simple random) Monte Carlo sampling.
	 * <!-- end-model-doc -->
	 * @see #PLAIN
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int PLAIN_VALUE = 1;

	/**
	 * An array of all the '<em><b>Uncertainty Sampling</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final UncertaintySampling[] VALUES_ARRAY =
		new UncertaintySampling[] {
			LATIN_HYPERCUBE,
			PLAIN,
		};

	/**
	 * A public read-only list of all the '<em><b>Uncertainty Sampling</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<UncertaintySampling> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Uncertainty Sampling</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static UncertaintySampling get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			UncertaintySampling result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Uncertainty Sampling</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static UncertaintySampling getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			UncertaintySampling result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Uncertainty Sampling</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static UncertaintySampling get(int value) {
		switch (value) {
			case LATIN_HYPERCUBE_VALUE: return LATIN_HYPERCUBE;
			case PLAIN_VALUE: return PLAIN;
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
	private UncertaintySampling(int value, String name, String literal) {
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
	
} //UncertaintySampling
