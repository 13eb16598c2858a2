/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Dispersivity Rule</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * How the longitudinal dispersivity is obtained.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getDispersivityRule()
 * @model
 * @generated
 */
public enum DispersivityRule implements Enumerator {
	/**
	 * The '<em><b>ENTERED</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The value entered in dispersivityMetres.
	 * <!-- end-model-doc -->
	 * @see #ENTERED_VALUE
	 * @generated
	 * @ordered
	 */
	ENTERED(0, "ENTERED", "ENTERED"),

	/**
	 * The '<em><b>TENTH OF SCALE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * alpha_L = 0.1 L, with L the flow length (common practice, no published source).
	 * <!-- end-model-doc -->
	 * @see #TENTH_OF_SCALE_VALUE
	 * @generated
	 * @ordered
	 */
	TENTH_OF_SCALE(1, "TENTH_OF_SCALE", "TENTH_OF_SCALE"),

	/**
	 * The '<em><b>XU ECKSTEIN 1995</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * alpha_L = 0.83 (log10 L)^2.414 with L in metres (Xu and Eckstein 1995, Ground Water 33:905); for L above 1 m.
	 * <!-- end-model-doc -->
	 * @see #XU_ECKSTEIN_1995_VALUE
	 * @generated
	 * @ordered
	 */
	XU_ECKSTEIN_1995(2, "XU_ECKSTEIN_1995", "XU_ECKSTEIN_1995");

	/**
	 * The '<em><b>ENTERED</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The value entered in dispersivityMetres.
	 * <!-- end-model-doc -->
	 * @see #ENTERED
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ENTERED_VALUE = 0;

	/**
	 * The '<em><b>TENTH OF SCALE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * alpha_L = 0.1 L, with L the flow length (common practice, no published source).
	 * <!-- end-model-doc -->
	 * @see #TENTH_OF_SCALE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int TENTH_OF_SCALE_VALUE = 1;

	/**
	 * The '<em><b>XU ECKSTEIN 1995</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * alpha_L = 0.83 (log10 L)^2.414 with L in metres (Xu and Eckstein 1995, Ground Water 33:905); for L above 1 m.
	 * <!-- end-model-doc -->
	 * @see #XU_ECKSTEIN_1995
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int XU_ECKSTEIN_1995_VALUE = 2;

	/**
	 * An array of all the '<em><b>Dispersivity Rule</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final DispersivityRule[] VALUES_ARRAY =
		new DispersivityRule[] {
			ENTERED,
			TENTH_OF_SCALE,
			XU_ECKSTEIN_1995,
		};

	/**
	 * A public read-only list of all the '<em><b>Dispersivity Rule</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<DispersivityRule> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Dispersivity Rule</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static DispersivityRule get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			DispersivityRule result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Dispersivity Rule</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static DispersivityRule getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			DispersivityRule result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Dispersivity Rule</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static DispersivityRule get(int value) {
		switch (value) {
			case ENTERED_VALUE: return ENTERED;
			case TENTH_OF_SCALE_VALUE: return TENTH_OF_SCALE;
			case XU_ECKSTEIN_1995_VALUE: return XU_ECKSTEIN_1995;
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
	private DispersivityRule(int value, String name, String literal) {
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
	
} //DispersivityRule
