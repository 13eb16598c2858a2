/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Zone Estimator Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * How block concentrations are estimated from the samples.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getZoneEstimatorKind()
 * @model
 * @generated
 */
public enum ZoneEstimatorKind implements Enumerator {
	/**
	 * The '<em><b>INVERSE DISTANCE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Inverse-distance weighting (Shepard 1968).
	 * <!-- end-model-doc -->
	 * @see #INVERSE_DISTANCE_VALUE
	 * @generated
	 * @ordered
	 */
	INVERSE_DISTANCE(0, "INVERSE_DISTANCE", "INVERSE_DISTANCE"),

	/**
	 * The '<em><b>ORDINARY KRIGING</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Ordinary kriging with a variogram model (Matheron 1963).
	 * <!-- end-model-doc -->
	 * @see #ORDINARY_KRIGING_VALUE
	 * @generated
	 * @ordered
	 */
	ORDINARY_KRIGING(1, "ORDINARY_KRIGING", "ORDINARY_KRIGING");

	/**
	 * The '<em><b>INVERSE DISTANCE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Inverse-distance weighting (Shepard 1968).
	 * <!-- end-model-doc -->
	 * @see #INVERSE_DISTANCE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int INVERSE_DISTANCE_VALUE = 0;

	/**
	 * The '<em><b>ORDINARY KRIGING</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Ordinary kriging with a variogram model (Matheron 1963).
	 * <!-- end-model-doc -->
	 * @see #ORDINARY_KRIGING
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ORDINARY_KRIGING_VALUE = 1;

	/**
	 * An array of all the '<em><b>Zone Estimator Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ZoneEstimatorKind[] VALUES_ARRAY =
		new ZoneEstimatorKind[] {
			INVERSE_DISTANCE,
			ORDINARY_KRIGING,
		};

	/**
	 * A public read-only list of all the '<em><b>Zone Estimator Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ZoneEstimatorKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Zone Estimator Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ZoneEstimatorKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ZoneEstimatorKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Zone Estimator Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ZoneEstimatorKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ZoneEstimatorKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Zone Estimator Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ZoneEstimatorKind get(int value) {
		switch (value) {
			case INVERSE_DISTANCE_VALUE: return INVERSE_DISTANCE;
			case ORDINARY_KRIGING_VALUE: return ORDINARY_KRIGING;
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
	private ZoneEstimatorKind(int value, String name, String literal) {
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
	
} //ZoneEstimatorKind
