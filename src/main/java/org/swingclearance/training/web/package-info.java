/** Pages of the trainer workspace: session log and correction forms, load charts, alert acknowledgement. */
package org.swingclearance.training.web;
