/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Sorption Isotherm</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The sorption isotherm of a contaminant.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getSorptionIsotherm()
 * @model
 * @generated
 */
public enum SorptionIsotherm implements Enumerator {
	/**
	 * The '<em><b>LINEAR</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * S = Kd C, with Kd entered or Koc foc (Karickhoff et al. 1979).
	 * <!-- end-model-doc -->
	 * @see #LINEAR_VALUE
	 * @generated
	 * @ordered
	 */
	LINEAR(0, "LINEAR", "LINEAR"),

	/**
	 * The '<em><b>FREUNDLICH</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * S = Kf C^n.
	 * <!-- end-model-doc -->
	 * @see #FREUNDLICH_VALUE
	 * @generated
	 * @ordered
	 */
	FREUNDLICH(1, "FREUNDLICH", "FREUNDLICH"),

	/**
	 * The '<em><b>LANGMUIR</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * S = Smax K C / (1 + K C).
	 * <!-- end-model-doc -->
	 * @see #LANGMUIR_VALUE
	 * @generated
	 * @ordered
	 */
	LANGMUIR(2, "LANGMUIR", "LANGMUIR");

	/**
	 * The '<em><b>LINEAR</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * S = Kd C, with Kd entered or Koc foc (Karickhoff et al. 1979).
	 * <!-- end-model-doc -->
	 * @see #LINEAR
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int LINEAR_VALUE = 0;

	/**
	 * The '<em><b>FREUNDLICH</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * S = Kf C^n.
	 * <!-- end-model-doc -->
	 * @see #FREUNDLICH
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int FREUNDLICH_VALUE = 1;

	/**
	 * The '<em><b>LANGMUIR</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * S = Smax K C / (1 + K C).
	 * <!-- end-model-doc -->
	 * @see #LANGMUIR
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int LANGMUIR_VALUE = 2;

	/**
	 * An array of all the '<em><b>Sorption Isotherm</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final SorptionIsotherm[] VALUES_ARRAY =
		new SorptionIsotherm[] {
			LINEAR,
			FREUNDLICH,
			LANGMUIR,
		};

	/**
	 * A public read-only list of all the '<em><b>Sorption Isotherm</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<SorptionIsotherm> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Sorption Isotherm</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SorptionIsotherm get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SorptionIsotherm result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Sorption Isotherm</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SorptionIsotherm getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SorptionIsotherm result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Sorption Isotherm</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SorptionIsotherm get(int value) {
		switch (value) {
			case LINEAR_VALUE: return LINEAR;
			case FREUNDLICH_VALUE: return FREUNDLICH;
			case LANGMUIR_VALUE: return LANGMUIR;
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
	private SorptionIsotherm(int value, String name, String literal) {
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
	
} //SorptionIsotherm
