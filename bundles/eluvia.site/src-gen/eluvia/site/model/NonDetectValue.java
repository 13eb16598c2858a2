/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Non Detect Value</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The value a non-detect takes in the zone analysis.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getNonDetectValue()
 * @model
 * @generated
 */
public enum NonDetectValue implements Enumerator {
	/**
	 * The '<em><b>HALF DETECTION LIMIT</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Half the detection limit (common practice).
	 * <!-- end-model-doc -->
	 * @see #HALF_DETECTION_LIMIT_VALUE
	 * @generated
	 * @ordered
	 */
	HALF_DETECTION_LIMIT(0, "HALF_DETECTION_LIMIT", "HALF_DETECTION_LIMIT"),

	/**
	 * The '<em><b>DETECTION LIMIT</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The detection limit (conservative).
	 * <!-- end-model-doc -->
	 * @see #DETECTION_LIMIT_VALUE
	 * @generated
	 * @ordered
	 */
	DETECTION_LIMIT(1, "DETECTION_LIMIT", "DETECTION_LIMIT"),

	/**
	 * The '<em><b>ZERO</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Zero (least conservative).
	 * <!-- end-model-doc -->
	 * @see #ZERO_VALUE
	 * @generated
	 * @ordered
	 */
	ZERO(2, "ZERO", "ZERO");

	/**
	 * The '<em><b>HALF DETECTION LIMIT</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Half the detection limit (common practice).
	 * <!-- end-model-doc -->
	 * @see #HALF_DETECTION_LIMIT
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int HALF_DETECTION_LIMIT_VALUE = 0;

	/**
	 * The '<em><b>DETECTION LIMIT</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The detection limit (conservative).
	 * <!-- end-model-doc -->
	 * @see #DETECTION_LIMIT
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int DETECTION_LIMIT_VALUE = 1;

	/**
	 * The '<em><b>ZERO</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Zero (least conservative).
	 * <!-- end-model-doc -->
	 * @see #ZERO
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ZERO_VALUE = 2;

	/**
	 * An array of all the '<em><b>Non Detect Value</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final NonDetectValue[] VALUES_ARRAY =
		new NonDetectValue[] {
			HALF_DETECTION_LIMIT,
			DETECTION_LIMIT,
			ZERO,
		};

	/**
	 * A public read-only list of all the '<em><b>Non Detect Value</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<NonDetectValue> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Non Detect Value</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static NonDetectValue get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			NonDetectValue result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Non Detect Value</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static NonDetectValue getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			NonDetectValue result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Non Detect Value</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static NonDetectValue get(int value) {
		switch (value) {
			case HALF_DETECTION_LIMIT_VALUE: return HALF_DETECTION_LIMIT;
			case DETECTION_LIMIT_VALUE: return DETECTION_LIMIT;
			case ZERO_VALUE: return ZERO;
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
	private NonDetectValue(int value, String name, String literal) {
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
	
} //NonDetectValue
